import { loadSeries } from '../math/series';
import { seriesMean } from './series-mean';

/**
 * Lag-1 sample autocorrelation of a series in row order.
 *
 * r₁ = Σ_{t=1}^{n−1} (x_t − x̄)(x_{t+1} − x̄) / Σ_{t=1}^{n} (x_t − x̄)²
 *
 * The same estimator as R's `acf(x)$acf[2]` (divisor n in numerator and denominator).
 * Why: rows of an ordinary bootstrap must be exchangeable; a clearly non-zero r₁ says
 * neighbouring rows are not, and a block scheme should be used instead.
 *
 * Cost: O(n). Does not change `x`.
 * Returns null when n < 2 or all values are equal (the ratio is 0/0, undefined).
 * Throws RangeError for a non-finite value.
 *
 * @example lag1Autocorrelation([1, 2, 3, 4]) // → 0.25
 */
export function lag1Autocorrelation(x: ArrayLike<number>): number | null {
  const n = x.length;
  if (n < 2) return null;
  // autocovariance(x, 1) in two passes instead of four (mean; then both sums at once): the
  // same terms added in the same order, so the same bits, for a check that runs once per
  // request on cold code (each pass over 10⁴ values costs a few ms before V8 optimizes it).
  const mean = seriesMean(x);
  let s0 = 0;
  let s1 = 0;
  // In WebAssembly from SERIES_WASM_MIN values up (math/series.ts): the same sums.
  const w = loadSeries(x);
  if (w) [s0, s1] = w.lag1Sums(mean);
  else {
    let here = x[0] - mean;
    for (let t = 0; t < n - 1; t++) {
      const next = x[t + 1] - mean;
      s0 += here * here;
      s1 += here * next;
      here = next;
    }
    s0 += here * here;
  }
  const c0 = s0 / n;
  const c1 = s1 / n;
  if (!(c0 > 0)) return null;
  return c1 / c0;
}
