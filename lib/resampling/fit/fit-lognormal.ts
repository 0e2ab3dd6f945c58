import { checkValues } from './check-values';
import { FitError } from './fit-error';
import type { FittedModel } from './fitted-model';

/**
 * Maximum-likelihood fit of a lognormal distribution: log X ~ N(μ, σ²).
 *
 *   μ̂ = mean of log xᵢ,   σ̂ = √( Σ (log xᵢ − μ̂)² / n )   (divisor n)
 *   log L = −(n/2)(log 2π + 2 log σ̂ + 1) − Σ log xᵢ
 *
 * Reference: Johnson, Kotz & Balakrishnan, "Continuous Univariate Distributions" vol. 1,
 * ch. 14; the same values as R's MASS::fitdistr(x, "lognormal").
 *
 * Cost: O(n). Does not change `x`.
 * Throws FitError: no values, a non-finite value, a value ≤ 0 (log undefined), or all
 * values equal (σ̂ = 0).
 *
 * @example fitLognormal([1, Math.E]).parameters // → { meanlog: 0.5, sdlog: 0.5 }
 */
export function fitLognormal(x: ArrayLike<number>): FittedModel {
  checkValues(x, 'lognormal');
  const n = x.length;
  const logs = new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (!(x[i] > 0)) throw new FitError('non-positive', `is ${x[i]}: a lognormal model needs values > 0`, i);
    logs[i] = Math.log(x[i]);
    sum += logs[i];
  }
  const meanlog = sum / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (logs[i] - meanlog) * (logs[i] - meanlog);
  const sdlog = Math.sqrt(ss / n);
  if (!(sdlog > 0)) throw new FitError('degenerate', 'all values are equal: a lognormal model with zero spread cannot be simulated from');
  const logLikelihood = -(n / 2) * (Math.log(2 * Math.PI) + 2 * Math.log(sdlog) + 1) - sum;
  return { family: 'lognormal', parameters: { meanlog, sdlog }, logLikelihood, n };
}
