import { flatTopLagWindow } from './flat-top-lag-window';

export interface BlockLengthPair {
  /** expected block length for the stationary bootstrap (Politis & Romano 1994) */
  stationary: number;
  /** block length for the circular (and moving-) block bootstrap */
  circular: number;
  /** Ĝ = Σ_{|k|≤M} λ(k/M) |k| R̂(k) */
  G: number;
  /** ĝ(0) = Σ_{|k|≤M} λ(k/M) R̂(k), the long-run variance estimate (2π × spectral density at 0) */
  g0: number;
}

/**
 * Optimal block lengths from autocovariances, the plug-in formulas of Politis & White
 * (2004) with the correction of Patton, Politis & White (2009).
 *
 *   Ĝ      = Σ_{k=−M}^{M} λ(k/M) |k| R̂(k)
 *   ĝ(0)   = Σ_{k=−M}^{M} λ(k/M) R̂(k)
 *   D̂_SB   = 2 ĝ(0)²          (stationary bootstrap; PPW 2009 corrected PW 2004's D_SB)
 *   D̂_CB   = (4/3) ĝ(0)²      (circular block bootstrap; same as the moving-block one)
 *   b̂_opt  = (2 Ĝ² / D̂)^{1/3} · n^{1/3}
 *
 * with λ the flat-top lag window. These minimise the asymptotic mean squared error of
 * the bootstrap variance of the sample mean. Results are not rounded or capped here (see
 * optimalBlockLength). When Ĝ = 0 both are 0; when ĝ(0) = 0 both are Infinity.
 *
 * References: Politis, D. N. & White, H. (2004), "Automatic block-length selection for the
 * dependent bootstrap", Econometric Reviews 23(1), 53–70; Patton, A., Politis, D. N. &
 * White, H. (2009), "Correction to ...", Econometric Reviews 28(4), 372–375.
 *
 * Cost: O(M). `acov[k]` is R̂(k) for k = 0 … M (missing lags count as 0).
 *
 * @example blockLengthFromAutocovariances(ar1Acov, 400, 1000).stationary // ≈ 15.2 for φ = 0.6
 */
export function blockLengthFromAutocovariances(acov: ArrayLike<number>, M: number, n: number): BlockLengthPair {
  let G = 0;
  let g0 = acov.length > 0 ? acov[0] : 0;
  for (let k = 1; k <= M && k < acov.length; k++) {
    const w = flatTopLagWindow(k / M);
    // lags −k and +k contribute equally (R̂ is even)
    G += 2 * w * k * acov[k];
    g0 += 2 * w * acov[k];
  }
  const g2 = g0 * g0;
  const n13 = Math.cbrt(n);
  const stationary = Math.cbrt((2 * G * G) / (2 * g2)) * n13;
  const circular = Math.cbrt((2 * G * G) / ((4 / 3) * g2)) * n13;
  return { stationary, circular, G, g0 };
}
