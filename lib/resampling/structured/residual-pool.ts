/**
 * The residuals that residual resampling draws from.
 *
 * raw:       e_i − ē (least-squares residuals with an intercept already have mean 0;
 *            centring guards against rounding)
 * modified:  r_i = e_i / √(1 − h_i), then centred: r_i − r̄
 *
 * Why modified: raw residuals have variance σ²(1 − h_i), smaller than the errors', so
 * resampling them makes the bootstrap SE too small by about √((n − p)/n); dividing by
 * √(1 − h_i) gives them the errors' variance (Davison & Hinkley 1997, eq. 6.9 and
 * Algorithm 6.3; Efron & Tibshirani 1993, §9.5). h_i ≥ 1 (a point that fixes the line by
 * itself) keeps its raw residual, which is then 0 anyway.
 *
 * Cost: O(n). Does not change its inputs.
 */
export function residualPool(residuals: ArrayLike<number>, leverages: ArrayLike<number> | null): Float64Array {
  const n = residuals.length;
  const out = new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const h = leverages ? leverages[i] : 0;
    out[i] = h < 1 ? residuals[i] / Math.sqrt(1 - h) : residuals[i];
    sum += out[i];
  }
  const mean = sum / n;
  for (let i = 0; i < n; i++) out[i] -= mean;
  return out;
}

/**
 * One residual-bootstrap response: y*_i = ŷ_i + ε*_i with ε*_i drawn with replacement from
 * `pool` (fixed design: the x values stay as observed). Indices ⌊u·n⌋ for u = random().
 * Reference: Efron & Tibshirani (1993), §9.5; Davison & Hinkley (1997), Algorithm 6.1.
 * Cost: O(n).
 */
export function fillResidualResponse(fitted: ArrayLike<number>, pool: ArrayLike<number>, random: () => number, out: Float64Array): Float64Array {
  const m = pool.length;
  for (let i = 0; i < fitted.length; i++) out[i] = fitted[i] + pool[Math.floor(random() * m)];
  return out;
}
