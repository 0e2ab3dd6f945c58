import { autocovariance } from './autocovariance';

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
  if (x.length < 2) return null;
  const [c0, c1] = autocovariance(x, 1);
  if (!(c0 > 0)) return null;
  return c1 / c0;
}
