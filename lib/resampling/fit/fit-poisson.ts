import { checkValues } from './check-values';
import { FitError } from './fit-error';
import type { FittedModel } from './fitted-model';
import { logFactorial } from './log-factorial';

/**
 * Maximum-likelihood fit of a Poisson distribution.
 *
 *   λ̂ = x̄,   log L = Σ (xᵢ log λ̂ − λ̂ − log xᵢ!)
 *
 * Reference: Casella & Berger, "Statistical Inference", 2nd ed., §7.2.2 (maximum likelihood); the same value as
 * R's MASS::fitdistr(x, "poisson").
 *
 * Cost: O(n). Does not change `x`.
 * Throws FitError: no values, a non-finite, negative or non-integer value (counts only),
 * or all values 0 (λ̂ = 0: every simulated sample would be all zeros).
 *
 * @example fitPoisson([0, 1, 2, 5]).parameters // → { lambda: 2 }
 */
export function fitPoisson(x: ArrayLike<number>): FittedModel {
  checkValues(x, 'poisson');
  const n = x.length;
  let sum = 0;
  let sumLogFact = 0;
  for (let i = 0; i < n; i++) {
    const v = x[i];
    if (v < 0) throw new FitError('negative', `is negative (${v}): a poisson model needs counts 0, 1, 2, …`, i);
    if (!Number.isInteger(v)) throw new FitError('non-integer', `is not a whole number (${v}): a poisson model needs counts`, i);
    sum += v;
    sumLogFact += logFactorial(v);
  }
  if (!(sum > 0)) throw new FitError('degenerate', 'all counts are 0: a poisson model needs a positive mean');
  const lambda = sum / n;
  const logLikelihood = sum * Math.log(lambda) - n * lambda - sumLogFact;
  return { family: 'poisson', parameters: { lambda }, logLikelihood, n };
}
