import { lag1Autocorrelation } from './lag1-autocorrelation';

export interface SerialDependence {
  /** lag-1 autocorrelation r₁, or null when undefined (n < 2 or constant data) */
  r1: number | null;
  /** the band |r₁| is compared with: 2/√n */
  threshold: number;
  /** |r₁| > 2/√n */
  clearlyNonZero: boolean;
  n: number;
}

/**
 * Is the lag-1 autocorrelation clearly non-zero?
 *
 * Rule: |r₁| > 2/√n. Under independence r₁ is approximately N(−1/n, 1/n) (Bartlett 1946;
 * Box, Jenkins & Reinsel §2.1.6), so ±2/√n is the usual approximate 95% band — common
 * practice, the same band (with 1.96) that R's `plot(acf(x))` draws. It is a screening
 * rule for a warning, not a formal test, and it only looks at lag 1.
 *
 * Needs at least 10 values to say anything (with fewer the band is wider than ±0.63 and
 * the normal approximation is poor); below that `clearlyNonZero` is false.
 *
 * Cost: O(n). Does not change `x`.
 *
 * @example serialDependence(series).clearlyNonZero // → true for an AR(1) with φ = 0.6, n = 200
 */
export function serialDependence(x: ArrayLike<number>): SerialDependence {
  const n = x.length;
  const threshold = n > 0 ? 2 / Math.sqrt(n) : Infinity;
  const r1 = lag1Autocorrelation(x);
  return { r1, threshold, clearlyNonZero: n >= 10 && r1 !== null && Math.abs(r1) > threshold, n };
}
