import { normalQuantile } from '../math/normal-quantile';

/**
 * The α quantile of B sorted replicates, by the convention of Davison & Hinkley (1997),
 * Bootstrap Methods and their Application, eq. (5.8) and §5.2.3: take the order statistic
 * t*₍(B+1)α₎; when (B + 1)α is not a whole number, interpolate between the neighbouring
 * order statistics k and k + 1 on the normal quantile scale,
 *
 *   t = t*₍k₎ + (Φ⁻¹(α) − Φ⁻¹(k/(B+1))) / (Φ⁻¹((k+1)/(B+1)) − Φ⁻¹(k/(B+1))) · (t*₍k+1₎ − t*₍k₎),
 *
 * and use the extreme order statistics when k = 0 or k = B. This is what R's boot.ci does
 * (its internal norm.inter), written with the same floating-point operations so that given
 * identical replicates the end points agree with R exactly.
 *
 * `sorted` must be ascending, finite and non-empty. Cost O(1).
 * Example: B = 999, α = 0.025 → the 25th smallest replicate.
 */
export function orderStatisticQuantile(sorted: Float64Array, alpha: number): number {
  const R = sorted.length;
  const rk = (R + 1) * alpha;
  const k = Math.trunc(rk);
  if (k === rk && k >= 1 && k <= R) return sorted[k - 1];
  if (k <= 0) return sorted[0];
  if (k >= R) return sorted[R - 1];
  const temp1 = normalQuantile(alpha);
  const temp2 = normalQuantile(k / (R + 1));
  const temp3 = normalQuantile((k + 1) / (R + 1));
  const tk = sorted[k - 1];
  const tk1 = sorted[k];
  return tk + ((temp1 - temp2) / (temp3 - temp2)) * (tk1 - tk);
}

/** True when (B + 1)α falls outside (1, B): the end point is an extreme order statistic. */
export function usesExtremeOrderStatistic(count: number, alpha: number): boolean {
  const rk = (count + 1) * alpha;
  return !(rk > 1 && rk < count);
}
