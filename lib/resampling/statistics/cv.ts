import * as z from 'zod/mini';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { onesCounts, weightedSumSquares } from './weighted-sums';

/**
 * Coefficient of variation s / x̄, with s the n − 1 standard deviation. Undefined when the
 * mean is 0 (the engine then reports a clear error for the data, or leaves such replicates
 * out with a warning). Cost O(n) per resample. Example: cv of [1, 2, 3] = 0.5.
 */
const schema = z.strictObject({ name: z.literal('cv'), column: columnName });

function cvFromCounts(x: Float64Array, counts: Int32Array, total: number): number {
  const { mean, ss } = weightedSumSquares(x, counts, total);
  return mean === 0 ? Number.NaN : Math.sqrt(ss / (total - 1)) / mean;
}

export const cv = defineStatistic({
  name: 'cv',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `coefficient of variation of ${s.column}`,
  minUnits: 2,
  prepare(data) {
    const x = data.values.x;
    return {
      n: data.n,
      estimate: cvFromCounts(x, onesCounts(data.n), data.n),
      fromCounts: (counts, total) => cvFromCounts(x, counts, total),
    };
  },
});
