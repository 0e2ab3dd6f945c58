/**
 * Monte Carlo standard error of the α quantile of B independent replicates, distribution
 * free: the rank of the true α quantile among B draws is Binomial(B, α), so the order
 * statistics at ranks Bα ∓ √(Bα(1−α)) bracket it with about 68% probability, and half the
 * distance between them estimates one standard error (the order-statistic interval for a
 * quantile, e.g. David, H. A. & Nagaraja, H. N. (2003), Order Statistics, 3rd ed., §7.1;
 * equivalently Siddiqui's (1960) density estimate in the asymptotic SE √(α(1−α)/B) / f(ξ_α)).
 *
 * Cost O(1). `sorted` ascending and finite. Example: for B = 10,000 normal replicates and
 * α = 0.025, about 0.03 (in SD units).
 */
export function quantileMonteCarloError(sorted: Float64Array, alpha: number): number {
  const B = sorted.length;
  if (B < 2) return Number.NaN;
  const half = Math.sqrt(B * alpha * (1 - alpha));
  const lo = clampRank(Math.floor(B * alpha - half), B);
  const hi = clampRank(Math.ceil(B * alpha + half), B);
  return (sorted[hi - 1] - sorted[lo - 1]) / 2;
}

function clampRank(r: number, B: number): number {
  return r < 1 ? 1 : r > B ? B : r;
}
