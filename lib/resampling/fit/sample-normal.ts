/**
 * Fills `out` with independent N(mean, sd²) draws by the Box–Muller transform:
 *   u₁, u₂ uniform on (0, 1];  r = √(−2 log u₁);  z₁ = r cos 2πu₂,  z₂ = r sin 2πu₂
 * — both of a pair are used, so `out.length` normals cost ⌈length/2⌉ pairs of uniforms.
 *
 * Reference: Box, G. E. P. & Muller, M. E. (1958), "A note on the generation of random
 * normal deviates", Ann. Math. Statist. 29, 610–611.
 *
 * `random` returns uniforms on [0, 1) (e.g. a seeded generator); 1 − u is used so that
 * log never sees 0. Deterministic for a given source. Cost: O(length).
 *
 * @example fillNormal(new Float64Array(10), 0, 1, seedrandom('s'))
 */
export function fillNormal(out: Float64Array, mean: number, sd: number, random: () => number): Float64Array {
  const n = out.length;
  const TWO_PI = 2 * Math.PI;
  let i = 0;
  for (; i + 1 < n; i += 2) {
    const r = Math.sqrt(-2 * Math.log(1 - random()));
    const theta = TWO_PI * random();
    out[i] = mean + sd * r * Math.cos(theta);
    out[i + 1] = mean + sd * r * Math.sin(theta);
  }
  if (i < n) {
    const r = Math.sqrt(-2 * Math.log(1 - random()));
    out[i] = mean + sd * r * Math.cos(TWO_PI * random());
  }
  return out;
}
