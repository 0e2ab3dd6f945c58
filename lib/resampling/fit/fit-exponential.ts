import { checkValues } from './check-values';
import { FitError } from './fit-error';
import type { FittedModel } from './fitted-model';

/**
 * Maximum-likelihood fit of an exponential distribution with rate λ (mean 1/λ).
 *
 *   λ̂ = 1 / x̄,   log L = n log λ̂ − λ̂ Σ xᵢ = n (log λ̂ − 1)
 *
 * Zeros are allowed (the density is positive at 0); negative values are not.
 * Reference: Casella & Berger, "Statistical Inference", 2nd ed., §7.2.2 (maximum likelihood); the same value as
 * R's MASS::fitdistr(x, "exponential").
 *
 * Cost: O(n). Does not change `x`.
 * Throws FitError: no values, a non-finite or negative value, or all values 0.
 *
 * @example fitExponential([1, 2, 3]).parameters // → { rate: 0.5 }
 */
export function fitExponential(x: ArrayLike<number>): FittedModel {
  checkValues(x, 'exponential');
  const n = x.length;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (x[i] < 0) throw new FitError('negative', `is negative (${x[i]}): an exponential model needs values ≥ 0`, i);
    sum += x[i];
  }
  if (!(sum > 0)) throw new FitError('degenerate', 'all values are 0: an exponential model needs a positive mean');
  const rate = n / sum;
  return { family: 'exponential', parameters: { rate }, logLikelihood: n * (Math.log(rate) - 1), n };
}
