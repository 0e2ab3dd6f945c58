/**
 * Number of distinct bootstrap resamples of n units (multisets of size n from n items),
 * C(2n − 1, n) (Efron & Tibshirani 1993, §6.2 and Problem 6.6; Hall, P. (1992), The
 * Bootstrap and Edgeworth Expansion, Appendix I). Computed in floating point; exact while
 * below 2⁵³. Example: distinctResamples(3) = 10.
 */
export function distinctResamples(n: number): number {
  let c = 1;
  // Once the product overflows it stays Infinity: stop there (for n = 10⁴ after ~140 of the
  // n steps, which on a cold start cost about a millisecond).
  for (let k = 1; k <= n && c !== Number.POSITIVE_INFINITY; k++) c = (c * (n - 1 + k)) / k;
  return Math.round(c);
}
