/**
 * Standard normal distribution function Φ(x).
 *
 * Marsaglia, G. (2004), "Evaluating the normal distribution", Journal of Statistical
 * Software 11(4): the Taylor series Φ(x) = ½ + φ(x)·(x + x³/3 + x⁵/(3·5) + …), summed until
 * the terms stop changing the total. Absolute error about 1e-15 for all x, which is what
 * BCa's adjusted levels need (they are probabilities, compared on an absolute scale).
 * For |x| > 38 the result is exactly 0 or 1 in double precision.
 *
 * Cost O(x²) terms (under 2,000 for |x| ≤ 38). Returns NaN for NaN.
 *
 * Example: normalCdf(1.959963984540054) ≈ 0.975.
 */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x > 38) return 1;
  if (x < -38) return 0;
  let s = x;
  let t = 0;
  let b = x;
  const q = x * x;
  let i = 1;
  while (s !== t) {
    t = s;
    i += 2;
    b *= q / i;
    s = t + b;
  }
  // 0.918938533204672741780 = ½·ln(2π)
  return 0.5 + s * Math.exp(-0.5 * q - 0.91893853320467274178);
}
