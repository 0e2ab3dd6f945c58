import type { FittedModel } from './fitted-model';
import { fillExponential } from './sample-exponential';
import { fillLognormal } from './sample-lognormal';
import { fillNormal } from './sample-normal';
import { fillPoisson } from './sample-poisson';

/**
 * Fills `out` with one simulated sample from a fitted model — the inner step of the
 * parametric bootstrap (Efron & Tibshirani 1993, "An Introduction to the Bootstrap", §6.5;
 * Davison & Hinkley 1997, "Bootstrap Methods and their Application", §2.2): draw a sample
 * of the same size from F̂ = F(·; θ̂), recompute the statistic, repeat B times.
 *
 * Deterministic for a given source. Cost: O(out.length).
 */
export function simulate(model: FittedModel, out: Float64Array, random: () => number): Float64Array {
  const p = model.parameters;
  switch (model.family) {
    case 'normal':
      return fillNormal(out, p.mean, p.sd, random);
    case 'exponential':
      return fillExponential(out, p.rate, random);
    case 'lognormal':
      return fillLognormal(out, p.meanlog, p.sdlog, random);
    case 'poisson':
      return fillPoisson(out, p.lambda, random);
  }
}
