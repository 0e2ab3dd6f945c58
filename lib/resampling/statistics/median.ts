import * as z from 'zod/mini';
import { medianFromCounts } from './count-scan';
import { columnName } from './fields';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Median: the middle order statistic, or the mean of the two middle ones for even n
 * (as R's median()).
 *
 * Resamples are read from counts in one scan over the presorted data up to the middle
 * rank — O(n) per replicate, no sort. For odd n = 2m + 1 the median is the order statistic
 * x₍m+1₎, whose exact bootstrap distribution is known (Maritz, J. S. & Jarrett, R. G.
 * (1978), "A note on estimating the variance of the sample median", JASA 73: 194–196); see
 * exact/order-statistic.ts. Example: median of [5, 1, 3, 2] = 2.5.
 */
const schema = z.strictObject({ name: z.literal('median'), column: columnName });

export const median = defineStatistic({
  name: 'median',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `median of ${s.column}`,
  minUnits: 2,
  nonSmooth: true,
  prepare(data) {
    const { sorted, order } = sortUnits(data.values.x);
    const n = data.n;
    return {
      n,
      estimate: medianFromCounts(sorted, order, onesCounts(n), n),
      fromCounts: (counts, total) => medianFromCounts(sorted, order, counts, total),
      countsQuantile: { sorted, order, p: null },
      orderStatistic: n % 2 === 1 ? { sorted, rank: (n + 1) / 2 } : undefined,
    };
  },
});
