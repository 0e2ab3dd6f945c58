import * as z from 'zod/mini';
import { medianFromCounts } from './count-scan';
import { columnName } from './fields';
import { lowerBound } from './lower-bound';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Median absolute deviation, 1.4826 · median |xᵢ − median(x)| (R's mad() with its default
 * constant, which makes it consistent for the normal σ; 1.4826 ≈ 1/Φ⁻¹(3/4)).
 *
 * For a resample the deviations are read from the presorted data without sorting: they
 * fall on both sides of the centre in increasing order, so a two-pointer merge outward from
 * the centre meets them in ascending order. Cost O(n) per resample.
 * Example: mad of [1, 2, 3, 4, 100] = 1.4826.
 */
const schema = z.strictObject({ name: z.literal('mad'), column: columnName });

export const MAD_CONSTANT = 1.4826;

function madFromCounts(sorted: Float64Array, order: Int32Array, counts: Int32Array, total: number): number {
  const centre = medianFromCounts(sorted, order, counts, total);
  const m = sorted.length;
  // first sorted position with value ≥ centre
  const lo = lowerBound(sorted, centre);
  let left = lo - 1;
  let right = lo;
  let leftLeft = 0; // copies of sorted[left] not yet consumed
  let rightLeft = 0;
  while (left >= 0 && (leftLeft = counts[order[left]]) === 0) left--;
  while (right < m && (rightLeft = counts[order[right]]) === 0) right++;
  const target = total % 2 === 1 ? (total - 1) / 2 : total / 2 - 1;
  let rank = 0;
  let first = Number.NaN;
  for (;;) {
    const dl = left >= 0 ? centre - sorted[left] : Number.POSITIVE_INFINITY;
    const dr = right < m ? sorted[right] - centre : Number.POSITIVE_INFINITY;
    let d: number;
    let take: number;
    if (dl < dr) {
      d = dl;
      take = leftLeft;
    } else {
      d = dr;
      take = rightLeft;
    }
    // ranks rank … rank + take − 1 all have deviation d
    if (Number.isNaN(first) && rank + take > target) {
      if (total % 2 === 1) return MAD_CONSTANT * d;
      first = d;
      if (rank + take > target + 1) return MAD_CONSTANT * d;
    } else if (!Number.isNaN(first)) {
      return MAD_CONSTANT * ((first + d) / 2);
    }
    rank += take;
    if (dl < dr) {
      left--;
      while (left >= 0 && (leftLeft = counts[order[left]]) === 0) left--;
    } else {
      right++;
      while (right < m && (rightLeft = counts[order[right]]) === 0) right++;
    }
  }
}

export const mad = defineStatistic({
  name: 'mad',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `median absolute deviation of ${s.column}`,
  minUnits: 2,
  nonSmooth: true,
  prepare(data) {
    const { sorted, order } = sortUnits(data.values.x);
    const n = data.n;
    return {
      n,
      estimate: madFromCounts(sorted, order, onesCounts(n), n),
      fromCounts: (counts, total) => madFromCounts(sorted, order, counts, total),
    };
  },
});
