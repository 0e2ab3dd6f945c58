/**
 * The trapezoidal flat-top lag window of Politis & Romano (1995), used by the
 * Politis & White (2004) block-length rule:
 *
 *   λ(t) = 1            for |t| ≤ 1/2
 *        = 2(1 − |t|)   for 1/2 < |t| ≤ 1
 *        = 0            otherwise.
 *
 * Why flat-top: it has no bias from the first lags (λ = 1 near 0), so the spectral
 * estimates converge fast for short-memory series.
 *
 * Reference: Politis, D. N. & Romano, J. P. (1995), "Bias-corrected nonparametric spectral
 * estimation", J. Time Series Analysis 16, 67–103; Politis & White (2004) §3.
 *
 * @example flatTopLagWindow(0.75) // → 0.5
 */
export function flatTopLagWindow(t: number): number {
  const a = Math.abs(t);
  if (a <= 0.5) return 1;
  if (a <= 1) return 2 * (1 - a);
  return 0;
}
