/**
 * Monte Carlo standard error of the bootstrap SE estimated from B replicates:
 *
 *   sd(ŝe_B) ≈ se · √((κ + 2) / (4B)),
 *
 * κ the excess kurtosis of the replicates' distribution. This is the Monte Carlo part of
 * Efron & Tibshirani (1993), An Introduction to the Bootstrap, eq. (19.8): the coefficient of
 * variation of ŝe_B is ≈ √(cv(ŝe_∞)² + (E[Δ̂] + 2)/(4B)). (For normal replicates κ = 0 and
 * the relative error is 1/√(2B).) Cost O(1).
 */
export function seMonteCarloError(se: number, excessKurtosis: number, B: number): number {
  const k = Math.max(excessKurtosis, -2);
  return se * Math.sqrt((k + 2) / (4 * B));
}

/**
 * Replicates needed for the Monte Carlo error of the SE to be at most `fraction` of the SE:
 * B = (κ + 2) / (4 · fraction²). Example: κ = 0, 1% → 5,000; 5% → 200 — in line with the
 * common practice that 100–200 replicates usually suffice for a standard error.
 */
export function replicatesForSe(excessKurtosis: number, fraction: number): number {
  const k = Math.max(excessKurtosis, -2);
  return Math.max(10, Math.ceil((k + 2) / (4 * fraction * fraction)));
}
