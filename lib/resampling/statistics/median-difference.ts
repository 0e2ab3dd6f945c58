
import { medianFromCounts } from './count-scan';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { splitGroups, twoGroupNeed, twoGroupSchema } from './two-group';

/**
 * Difference of group medians median(a) − median(b) (levels [a, b]); resampled within
 * groups with group sizes fixed. Each group's median is read from counts over that group's
 * presorted values. Cost O(n) per resample. Example: a = [1, 5, 9], b = [2, 2] → 3.
 */
const schema = twoGroupSchema('median-difference');

export const medianDifference = defineStatistic({
  name: 'median-difference',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  groupColumn: twoGroupNeed,
  describe: (s) => `difference in median ${s.column} between ${s.group} ${s.levels[0]} and ${s.levels[1]}`,
  minUnits: 2,
  nonSmooth: true,
  prepare(data) {
    const x = data.values.x;
    const group = data.group!;
    const [ua, ub] = splitGroups(group);
    const a = sortUnits(x, ua);
    const b = sortUnits(x, ub);
    const f = (counts: Int32Array) => {
      let na = 0;
      for (let k = 0; k < ua.length; k++) na += counts[ua[k]];
      let nb = 0;
      for (let k = 0; k < ub.length; k++) nb += counts[ub[k]];
      return medianFromCounts(a.sorted, a.order, counts, na) - medianFromCounts(b.sorted, b.order, counts, nb);
    };
    return { n: data.n, estimate: f(new Int32Array(data.n).fill(1)), groups: group, fromCounts: f };
  },
});
