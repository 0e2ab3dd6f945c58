import * as z from 'zod/mini';
import { quantileFromCounts } from './count-scan';
import { columnName } from './fields';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Interquartile range Q(0.75) − Q(0.25), quantiles of Hyndman–Fan type 7 (as R's IQR()).
 * Cost O(n) per resample. Example: IQR of [1, 2, 3, 4, 5] = 2.
 */
const schema = z.strictObject({ name: z.literal('iqr'), column: columnName });

export const iqr = defineStatistic({
  name: 'iqr',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `interquartile range of ${s.column}`,
  minUnits: 2,
  nonSmooth: true,
  prepare(data) {
    const { sorted, order } = sortUnits(data.values.x);
    const n = data.n;
    const f = (counts: Int32Array, total: number) =>
      quantileFromCounts(sorted, order, counts, total, 0.75) - quantileFromCounts(sorted, order, counts, total, 0.25);
    return { n, estimate: f(onesCounts(n), n), fromCounts: f };
  },
});
