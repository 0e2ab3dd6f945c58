import { logFactorial } from './log-factorial';

/** Below this mean draws use inversion; at or above it, PTRS (as NumPy does, threshold 10). */
export const POISSON_INVERSION_LIMIT = 10;

/**
 * One Poisson(λ) draw by sequential-search inversion of the CDF: start at k = 0 with
 * p = e^{−λ} and add p_k = p_{k−1}·λ/k until the running sum passes one uniform u.
 * Exact; expected cost 1 + λ steps, so used only for small λ.
 * Reference: Devroye (1986), "Non-Uniform Random Variate Generation", §X.3.3.
 */
export function poissonInversion(lambda: number, random: () => number): number {
  const u = random();
  let k = 0;
  let p = Math.exp(-lambda);
  let cdf = p;
  // p > 0 guards against rounding leaving u above the last representable cdf
  while (u > cdf && p > 0) {
    k++;
    p *= lambda / k;
    cdf += p;
  }
  return k;
}

/**
 * One Poisson(λ) draw, λ ≥ 10, by Hörmann's transformed rejection with squeeze (PTRS).
 * Exact (a rejection method); about 1.1–1.2 pairs of uniforms per draw, whatever λ.
 *
 *   b = 0.931 + 2.53√λ,  a = −0.059 + 0.02483 b,  1/α = 1.1239 + 1.1328/(b − 3.4),
 *   v_r = 0.9277 − 3.6224/(b − 2)
 *   repeat: U = u₁ − ½, V = u₂, us = ½ − |U|, k = ⌊(2a/us + b)U + λ + 0.43⌋
 *     accept at once if us ≥ 0.07 and V ≤ v_r; reject if k < 0 or (us < 0.013 and V > us);
 *     accept if log V + log(1/α) − log(a/us² + b) ≤ −λ + k log λ − log k!
 *
 * Reference: Hörmann, W. (1993), "The transformed rejection method for generating Poisson
 * random variables", Insurance: Mathematics and Economics 12, 39–45.
 */
export function poissonPtrs(lambda: number, random: () => number): number {
  const slam = Math.sqrt(lambda);
  const loglam = Math.log(lambda);
  const b = 0.931 + 2.53 * slam;
  const a = -0.059 + 0.02483 * b;
  const invalpha = 1.1239 + 1.1328 / (b - 3.4);
  const vr = 0.9277 - 3.6224 / (b - 2);
  for (;;) {
    const U = random() - 0.5;
    const V = random();
    const us = 0.5 - Math.abs(U);
    const k = Math.floor(((2 * a) / us + b) * U + lambda + 0.43);
    if (us >= 0.07 && V <= vr) return k;
    if (k < 0 || (us < 0.013 && V > us)) continue;
    if (Math.log(V) + Math.log(invalpha) - Math.log(a / (us * us) + b) <= -lambda + k * loglam - logFactorial(k)) return k;
  }
}

/**
 * Fills `out` with independent Poisson(λ) draws: inversion for λ < 10, PTRS otherwise.
 * Deterministic for a given source. Cost: O(length · min(λ, const)).
 */
export function fillPoisson(out: Float64Array, lambda: number, random: () => number): Float64Array {
  const draw = lambda < POISSON_INVERSION_LIMIT ? poissonInversion : poissonPtrs;
  for (let i = 0; i < out.length; i++) out[i] = draw(lambda, random);
  return out;
}
