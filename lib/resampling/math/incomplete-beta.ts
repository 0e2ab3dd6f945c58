import { logGamma } from './log-gamma';

/**
 * Regularized incomplete beta function I_x(a, b) = B(x; a, b) / B(a, b).
 *
 * Continued fraction (Lentz's method) as in Press et al., Numerical Recipes, 3rd ed. (2007),
 * §6.4, using I_x(a,b) = 1 − I_{1−x}(b,a) when x > (a+1)/(a+b+2) so the fraction converges
 * fast. Used for binomial tail probabilities: P(Bin(n, p) ≥ k) = I_p(k, n − k + 1).
 *
 * Cost O(√max(a, b)) iterations. Throws nothing; returns NaN for x outside [0, 1].
 *
 * Example: incompleteBeta(0.5, 2, 2) = 0.5.
 */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1)) return Number.NaN;
  if (x === 0) return 0;
  if (x === 1) return 1;
  const lbt = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(lbt) * betaContinuedFraction(x, a, b)) / a;
  return 1 - (Math.exp(lbt) * betaContinuedFraction(1 - x, b, a)) / b;
}

function betaContinuedFraction(x: number, a: number, b: number): number {
  const TINY = 1e-300;
  const EPS = 1e-16;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 100_000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return h;
}
