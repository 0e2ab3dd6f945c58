import * as z from 'zod/mini';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { onesCounts, weightedMean } from './weighted-sums';

/**
 * Mean, x̄ = Σxᵢ / n.
 *
 * Resample value Σcᵢxᵢ / Σcᵢ. Leave-one-out in O(1) each: (S − xᵢ)/(n − 1).
 * Ideal bootstrap (B = ∞) answer in closed form: the bootstrap mean is unbiased and its SE
 * is the plug-in SE √(Σ(xᵢ − x̄)²) / n (Efron, B. & Tibshirani, R. J. (1993), An
 * Introduction to the Bootstrap, Chapman & Hall, §5.2 and eq. 6.9).
 * Cost O(n) per resample. Example: mean of [1, 2, 6] = 3.
 */
const schema = z.strictObject({ name: z.literal('mean'), column: columnName });

export const mean = defineStatistic({
  name: 'mean',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `mean of ${s.column}`,
  minUnits: 2,
  prepare(data) {
    const x = data.values.x;
    const n = data.n;
    const estimate = weightedMean(x, onesCounts(n), n);
    return {
      n,
      estimate,
      fromCounts: (counts, total) => weightedMean(x, counts, total),
      leaveOneOut() {
        let s = 0;
        for (let i = 0; i < n; i++) s += x[i];
        const out = new Float64Array(n);
        for (let i = 0; i < n; i++) out[i] = (s - x[i]) / (n - 1);
        return out;
      },
      closedForm() {
        let ss = 0;
        for (let i = 0; i < n; i++) ss += (x[i] - estimate) ** 2;
        return { se: Math.sqrt(ss) / n, bias: 0, method: 'closed-form' };
      },
    };
  },
});
