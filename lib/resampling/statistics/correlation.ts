import * as z from 'zod/mini';
import { columnName } from './fields';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts, weightedPairSums } from './weighted-sums';

/**
 * Correlation of x and y.
 *  - pearson:  r = Σ(x − x̄)(y − ȳ) / √(Σ(x − x̄)² Σ(y − ȳ)²)
 *  - spearman: Pearson's r of the ranks, tied values getting the mean of their ranks
 *              (as R's cor(method = "spearman")).
 * For a resample the Spearman ranks come from counts and presorted x and y: a run of equal
 * values holding C copies after R copies of smaller values has mid-rank R + (C + 1)/2.
 * Undefined (NaN) when a resample has no spread in x or y. Cost O(n) per resample.
 * Example: pearson of x = [1, 2, 3], y = [2, 4, 7] = 0.9934….
 */
const schema = z.strictObject({
  name: z.literal('correlation'),
  x: columnName,
  y: columnName,
  method: z._default(z.enum(['pearson', 'spearman'], { error: 'method must be pearson or spearman' }), 'pearson'),
});

function pearson(x: Float64Array, y: Float64Array, counts: Int32Array, total: number): number {
  const s = weightedPairSums(x, y, counts, total);
  const d = Math.sqrt(s.sxx * s.syy);
  return d > 0 ? s.sxy / d : Number.NaN;
}

/** Mid-ranks of the resample written into `ranks` (by unit). */
function midRanks(sorted: Float64Array, order: Int32Array, counts: Int32Array, ranks: Float64Array): void {
  const m = sorted.length;
  let below = 0;
  let p = 0;
  while (p < m) {
    let q = p;
    let c = 0;
    const v = sorted[p];
    while (q < m && sorted[q] === v) {
      c += counts[order[q]];
      q++;
    }
    const r = below + (c + 1) / 2;
    for (let k = p; k < q; k++) ranks[order[k]] = r;
    below += c;
    p = q;
  }
}

export const correlation = defineStatistic({
  name: 'correlation',
  schema,
  numericColumns: (s) => [
    { role: 'x', column: s.x, path: 'statistic.x' },
    { role: 'y', column: s.y, path: 'statistic.y' },
  ],
  describe: (s) => `${s.method === 'spearman' ? 'Spearman' : 'Pearson'} correlation of ${s.x} and ${s.y}`,
  minUnits: 3,
  prepare(data, s) {
    const x = data.values.x;
    const y = data.values.y;
    const n = data.n;
    if (s.method === 'pearson') {
      return { n, estimate: pearson(x, y, onesCounts(n), n), fromCounts: (c, t) => pearson(x, y, c, t) };
    }
    const sx = sortUnits(x);
    const sy = sortUnits(y);
    const rx = new Float64Array(n);
    const ry = new Float64Array(n);
    const f = (counts: Int32Array, total: number) => {
      midRanks(sx.sorted, sx.order, counts, rx);
      midRanks(sy.sorted, sy.order, counts, ry);
      return pearson(rx, ry, counts, total);
    };
    return { n, estimate: f(onesCounts(n), n), fromCounts: f };
  },
});
