import { checkValues } from './check-values';
import { FitError } from './fit-error';
import type { FittedModel } from './fitted-model';

/**
 * Maximum-likelihood fit of a normal distribution N(μ, σ²).
 *
 *   μ̂ = x̄,   σ̂ = √( Σ (xᵢ − x̄)² / n )     (divisor n: the MLE, not the n − 1 estimate)
 *   log L = −(n/2) (log 2π + 2 log σ̂ + 1)
 *
 * Reference: any mathematical-statistics text, e.g. Casella & Berger, "Statistical
 * Inference", 2nd ed., §7.2.2; the same values as R's MASS::fitdistr(x, "normal").
 *
 * Cost: O(n), two passes. Does not change `x`.
 * Throws FitError: no values, a non-finite value, or all values equal (σ̂ = 0: every
 * simulated sample would be constant and the standard error 0).
 *
 * @example fitNormal([1, 2, 3]).parameters // → { mean: 2, sd: 0.8165 }
 */
export function fitNormal(x: ArrayLike<number>): FittedModel {
  checkValues(x, 'normal');
  const n = x.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += x[i];
  const mean = sum / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (x[i] - mean) * (x[i] - mean);
  const sd = Math.sqrt(ss / n);
  if (!(sd > 0)) throw new FitError('degenerate', 'all values are equal: a normal model with zero spread cannot be simulated from');
  const logLikelihood = -(n / 2) * (Math.log(2 * Math.PI) + 2 * Math.log(sd) + 1);
  return { family: 'normal', parameters: { mean, sd }, logLikelihood, n };
}
