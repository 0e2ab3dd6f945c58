/**
 * Number of distinct bootstrap resamples of n units (multisets of size n from n items),
 * C(2n − 1, n) (Efron & Tibshirani 1993, §6.2 and Problem 6.6; Hall, P. (1992), The
 * Bootstrap and Edgeworth Expansion, Appendix I). Computed in floating point; exact while
 * below 2⁵³. Example: distinctResamples(3) = 10.
 */
export function distinctResamples(n: number): number {
  let c = 1;
  for (let k = 1; k <= n; k++) c = (c * (n - 1 + k)) / k;
  return Math.round(c);
}
