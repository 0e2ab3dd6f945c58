import { incompleteBeta } from '../math/incomplete-beta';

/**
 * Exact (B = ∞) bootstrap distribution of the k-th order statistic of a resample of n.
 * The k-th smallest of n draws is ≤ x₍ⱼ₎ exactly when at least k draws fall on the j
 * smallest points, so
 *
 *   P(X*₍k₎ ≤ x₍ⱼ₎) = P(Binomial(n, j/n) ≥ k) = I_{j/n}(k, n − k + 1),
 *   wⱼ = P(X*₍k₎ = x₍ⱼ₎) = I_{j/n}(k, n−k+1) − I_{(j−1)/n}(k, n−k+1).
 *
 * For the median of odd n = 2m + 1 (k = m + 1) this is Maritz, J. S. & Jarrett, R. G.
 * (1978), "A note on estimating the variance of the sample median", JASA 73: 194–196:
 * wⱼ = n!/(m!)² ∫_{(j−1)/n}^{j/n} t^m (1 − t)^m dt. The exact SE is √(Σwⱼx₍ⱼ₎² − (Σwⱼx₍ⱼ₎)²),
 * the bias Σwⱼx₍ⱼ₎ − x₍k₎. Cost O(n) incomplete-beta evaluations.
 */
export function orderStatisticWeights(n: number, k: number): Float64Array {
  const w = new Float64Array(n);
  let prev = 0;
  for (let j = 1; j <= n; j++) {
    const cur = j === n ? 1 : incompleteBeta(j / n, k, n - k + 1);
    w[j - 1] = Math.max(0, cur - prev);
    prev = cur;
  }
  return w;
}

export function exactOrderStatistic(sorted: Float64Array, k: number): { se: number; bias: number; mean: number } {
  const n = sorted.length;
  const w = orderStatisticWeights(n, k);
  let mean = 0;
  for (let j = 0; j < n; j++) mean += w[j] * sorted[j];
  let v = 0;
  for (let j = 0; j < n; j++) v += w[j] * (sorted[j] - mean) ** 2;
  return { se: Math.sqrt(v), bias: mean - sorted[k - 1], mean };
}
