/**
 * Fills `out` with independent exponential draws of the given rate by inversion of the
 * CDF F(x) = 1 − e^{−rate·x}:  x = −log(1 − u) / rate,  u uniform on [0, 1).
 *
 * Reference: Devroye, L. (1986), "Non-Uniform Random Variate Generation", §II.2 (inversion).
 * Deterministic for a given source; one uniform per draw. Cost: O(length).
 */
export function fillExponential(out: Float64Array, rate: number, random: () => number): Float64Array {
  for (let i = 0; i < out.length; i++) out[i] = -Math.log(1 - random()) / rate;
  return out;
}
