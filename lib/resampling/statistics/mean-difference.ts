
import { defineStatistic } from './types';
import { splitGroups, twoGroupNeed, twoGroupSchema } from './two-group';

/**
 * Difference of group means x̄_a − x̄_b (levels [a, b]).
 *
 * The schemes resample within each group, keeping group sizes fixed (Efron & Tibshirani
 * 1993, §8.3 "two-sample problem"). Ideal bootstrap answer in closed form: unbiased, with
 * SE √(σ̂²_a/n_a + σ̂²_b/n_b), σ̂² the plug-in (divisor n) variances — each bootstrap mean
 * has plug-in SE σ̂/√n and the groups are drawn independently.
 * Cost O(n) per resample. Example: a = [1, 3], b = [0, 0] → 2.
 */
const schema = twoGroupSchema('mean-difference');

export const meanDifference = defineStatistic({
  name: 'mean-difference',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  groupColumn: twoGroupNeed,
  describe: (s) => `difference in mean ${s.column} between ${s.group} ${s.levels[0]} and ${s.levels[1]}`,
  minUnits: 2,
  prepare(data) {
    const x = data.values.x;
    const group = data.group!;
    const f = (counts: Int32Array) => {
      let sa = 0;
      let sb = 0;
      let na = 0;
      let nb = 0;
      for (let i = 0; i < x.length; i++) {
        const c = counts[i];
        if (group[i] === 0) {
          sa += c * x[i];
          na += c;
        } else {
          sb += c * x[i];
          nb += c;
        }
      }
      return sa / na - sb / nb;
    };
    const estimate = f(new Int32Array(data.n).fill(1));
    return {
      n: data.n,
      estimate,
      groups: group,
      fromCounts: f,
      closedForm() {
        let v = 0;
        for (const units of splitGroups(group)) {
          let s = 0;
          for (const i of units) s += x[i];
          const m = s / units.length;
          let ss = 0;
          for (const i of units) ss += (x[i] - m) ** 2;
          v += ss / units.length / units.length;
        }
        return { se: Math.sqrt(v), bias: 0, method: 'closed-form' };
      },
    };
  },
});
