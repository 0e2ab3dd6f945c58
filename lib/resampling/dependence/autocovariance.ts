import { seriesMean } from './series-mean';

/**
 * Sample autocovariances of a series in row order.
 *
 * R̂(k) = (1/n) Σ_{t=1}^{n−k} (x_t − x̄)(x_{t+k} − x̄),  k = 0 … maxLag.
 *
 * Convention: divisor n (not n − k) and centring on the overall mean, as R's
 * `acf(x, type = "covariance")` and Box, Jenkins & Reinsel, "Time Series Analysis",
 * §2.1.5; the divisor n keeps the sequence positive semi-definite, which the spectral
 * estimates of the block-length rule rely on.
 *
 * Cost: O(n · maxLag). Does not change `x`.
 * Throws RangeError when `x` is empty, holds a non-finite value, or maxLag is negative or
 * not an integer; lags ≥ n give 0.
 *
 * @example autocovariance([1, 2, 3, 4], 1) // → Float64Array [1.25, 0.3125]
 */
export function autocovariance(x: ArrayLike<number>, maxLag: number): Float64Array {
  const n = x.length;
  if (n === 0) throw new RangeError('autocovariance needs at least one value');
  if (!Number.isInteger(maxLag) || maxLag < 0) throw new RangeError('maxLag must be a non-negative integer');
  const mean = seriesMean(x);
  const centred = new Float64Array(n);
  for (let i = 0; i < n; i++) centred[i] = x[i] - mean;
  const out = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag && k < n; k++) {
    let s = 0;
    for (let t = 0; t + k < n; t++) s += centred[t] * centred[t + k];
    out[k] = s / n;
  }
  return out;
}
