import { loadSeries } from './series';

/**
 * Sample moments of a set of replicates (or any numbers), computed in two passes for
 * accuracy (the mean first, then central sums).
 *
 *   mean      x̄ = Σx / B
 *   variance  s² = Σ(x − x̄)² / (B − 1)         (the B−1 divisor, as R's var)
 *   skewness  g₁ = m₃ / m₂^{3/2}                 (moment ratio, divisor B)
 *   kurtosis  g₂ = m₄ / m₂² − 3                  (excess kurtosis, divisor B)
 *
 * with m_k = Σ(x − x̄)^k / B. Values are shifted by the first one before summing, so
 * identical values give exactly zero spread (no rounding residue). Reference: Joanes, D. N. & Gill, C. A. (1998), "Comparing
 * measures of sample skewness and kurtosis", The Statistician 47: 183–189 (g₁, g₂).
 * Cost O(B). Non-finite entries must be removed by the caller.
 *
 * Example: moments([1, 2, 3]).variance = 1.
 */
export interface Moments {
  count: number;
  mean: number;
  variance: number;
  sd: number;
  skewness: number;
  excessKurtosis: number;
}

export function moments(x: ArrayLike<number>): Moments {
  const B = x.length;
  const shift = B > 0 ? x[0] : 0;
  // Both passes in WebAssembly from SERIES_WASM_MIN values up (series.ts): the same sums.
  const w = loadSeries(x);
  let s = 0;
  if (w) s = w.shiftedSum(shift);
  else for (let i = 0; i < B; i++) s += x[i] - shift;
  const meanShifted = s / B;
  const mean = shift + meanShifted;
  let m2 = 0;
  let m3 = 0;
  let m4 = 0;
  if (w) [m2, m3, m4] = w.centralSums(shift, meanShifted);
  else {
    for (let i = 0; i < B; i++) {
      const d = x[i] - shift - meanShifted;
      const d2 = d * d;
      m2 += d2;
      m3 += d2 * d;
      m4 += d2 * d2;
    }
  }
  const variance = B > 1 ? m2 / (B - 1) : Number.NaN;
  m2 /= B;
  m3 /= B;
  m4 /= B;
  const skewness = m2 > 0 ? m3 / Math.pow(m2, 1.5) : 0;
  const excessKurtosis = m2 > 0 ? m4 / (m2 * m2) - 3 : 0;
  return { count: B, mean, variance, sd: Math.sqrt(variance), skewness, excessKurtosis };
}
