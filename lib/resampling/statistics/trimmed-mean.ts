import * as z from 'zod/mini';
import { columnName } from './fields';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Trimmed mean: drop k = ⌊n·trim⌋ values from each end of the sorted sample and average the
 * remaining n − 2k (the convention of R's mean(x, trim = …)). trim is the fraction cut from
 * each end, 0 ≤ trim < 0.5.
 * For a resample the kept ranks [k, total − k) are summed in one scan of the presorted data
 * with counts. Cost O(n) per resample. Example: trim 0.2 of [1, 2, 3, 4, 100] = 3.
 */
const schema = z.strictObject({
  name: z.literal('trimmed-mean'),
  column: columnName,
  trim: z
    .number({ error: 'trim must be a number from 0 to below 0.5' })
    .check(z.gte(0, 'trim must be from 0 to below 0.5'), z.lt(0.5, 'trim must be below 0.5 (0.5 would be the median)')),
});

export const trimmedMean = defineStatistic({
  name: 'trimmed-mean',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `${s.trim} trimmed mean of ${s.column}`,
  minUnits: 2,
  prepare(data, s) {
    const { sorted, order } = sortUnits(data.values.x);
    const n = data.n;
    const f = (counts: Int32Array, total: number) => {
      const k = Math.floor(total * s.trim);
      const from = k;
      const to = total - k;
      let cum = 0;
      let sum = 0;
      for (let p = 0; p < sorted.length && cum < to; p++) {
        const c = counts[order[p]];
        if (c === 0) continue;
        const lo = cum > from ? cum : from;
        const hi = cum + c < to ? cum + c : to;
        if (hi > lo) sum += (hi - lo) * sorted[p];
        cum += c;
      }
      return sum / (to - from);
    };
    return { n, estimate: f(onesCounts(n), n), fromCounts: f };
  },
});
