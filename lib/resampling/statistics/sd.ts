import * as z from 'zod/mini';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { varianceFromCounts } from './variance';
import { onesCounts } from './weighted-sums';

/**
 * Standard deviation s = √(Σ(xᵢ − x̄)² / (n − 1)) (as R's sd()). Cost O(n) per resample.
 * Example: sd of [2, 4, 4, 4, 5, 5, 7, 9] = 2.138….
 */
const schema = z.strictObject({ name: z.literal('sd'), column: columnName });

export const sd = defineStatistic({
  name: 'sd',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `standard deviation of ${s.column}`,
  minUnits: 2,
  prepare(data) {
    const x = data.values.x;
    return {
      n: data.n,
      estimate: Math.sqrt(varianceFromCounts(x, onesCounts(data.n), data.n)),
      fromCounts: (counts, total) => Math.sqrt(varianceFromCounts(x, counts, total)),
    };
  },
});
