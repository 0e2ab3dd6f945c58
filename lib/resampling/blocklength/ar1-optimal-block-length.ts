/**
 * The theoretical optimal block lengths for the mean of an AR(1) series
 * x_t = φ x_{t−1} + e_t (|φ| < 1), from the Politis & White (2004) / Patton, Politis &
 * White (2009) formulas with the true autocovariances R(k) = γ₀ φ^|k|.
 *
 * Derivation (stated here because the tests rely on it):
 *   g  = Σ_k R(k)         = γ₀ (1 + φ) / (1 − φ)
 *   G  = Σ_k |k| R(k)     = 2 γ₀ Σ_{k≥1} k φ^k = 2 γ₀ φ / (1 − φ)²
 *   G / g                 = 2φ / (1 − φ²)
 *   b_SB = (2G² / (2g²))^{1/3} n^{1/3}      = |2φ / (1 − φ²)|^{2/3} n^{1/3}
 *   b_CB = (2G² / ((4/3)g²))^{1/3} n^{1/3}  = (3/2)^{1/3} |2φ / (1 − φ²)|^{2/3} n^{1/3}
 *
 * γ₀ cancels, so the answer does not depend on the innovation variance.
 * For φ = 0.6, n = 1000: b_SB ≈ 15.20, b_CB ≈ 17.40.
 *
 * Throws RangeError unless |φ| < 1 and n ≥ 1.
 */
export function ar1OptimalBlockLength(phi: number, n: number): { stationary: number; circular: number } {
  if (!(Math.abs(phi) < 1)) throw new RangeError('AR(1) needs |phi| < 1');
  if (!(n >= 1)) throw new RangeError('n must be at least 1');
  const ratio = Math.abs((2 * phi) / (1 - phi * phi));
  const stationary = Math.pow(ratio, 2 / 3) * Math.cbrt(n);
  return { stationary, circular: Math.cbrt(1.5) * stationary };
}
