import * as z from 'zod/mini';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { onesCounts, weightedSumSquares } from './weighted-sums';

/**
 * Sample variance with the n − 1 divisor, s² = Σ(xᵢ − x̄)² / (n − 1) (as R's var()).
 * Two passes (mean, then centred squares) for accuracy. Cost O(n) per resample.
 * Example: variance of [1, 2, 3, 4] = 5/3.
 */
const schema = z.strictObject({ name: z.literal('variance'), column: columnName });

export function varianceFromCounts(x: Float64Array, counts: Int32Array, total: number): number {
  return weightedSumSquares(x, counts, total).ss / (total - 1);
}

export const variance = defineStatistic({
  name: 'variance',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `variance of ${s.column}`,
  minUnits: 2,
  prepare(data) {
    const x = data.values.x;
    return {
      n: data.n,
      estimate: varianceFromCounts(x, onesCounts(data.n), data.n),
      fromCounts: (counts, total) => varianceFromCounts(x, counts, total),
    };
  },
});
