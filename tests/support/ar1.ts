import seedrandom from 'seedrandom';

/**
 * A test series: AR(1) x_t = φ x_{t−1} + e_t with N(0, 1) innovations (Box–Muller on a
 * seeded source), after 200 burn-in steps so the start is close to stationary.
 */
export function ar1Series(n: number, phi: number, seed: string): Float64Array {
  const rng = seedrandom(seed);
  const x = new Float64Array(n);
  let prev = 0;
  for (let t = -200; t < n; t++) {
    const z = Math.sqrt(-2 * Math.log(1 - rng())) * Math.cos(2 * Math.PI * rng());
    prev = phi * prev + z;
    if (t >= 0) x[t] = prev;
  }
  return x;
}
