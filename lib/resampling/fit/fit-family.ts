import { fitExponential } from './fit-exponential';
import { FitError } from './fit-error';
import { fitLognormal } from './fit-lognormal';
import { fitNormal } from './fit-normal';
import { fitPoisson } from './fit-poisson';
import { FAMILIES, type Family, type FittedModel } from './fitted-model';

const FITTERS: Record<Family, (x: ArrayLike<number>) => FittedModel> = {
  normal: fitNormal,
  exponential: fitExponential,
  lognormal: fitLognormal,
  poisson: fitPoisson,
};

/**
 * Maximum-likelihood fit of the named family (see fitNormal, fitExponential, fitLognormal,
 * fitPoisson for formulas). Throws FitError with code 'unknown-family' for any other name,
 * or the family's own FitError when the data do not suit it.
 */
export function fitFamily(family: string, x: ArrayLike<number>): FittedModel {
  if (!(FAMILIES as readonly string[]).includes(family)) {
    throw new FitError('unknown-family', `unknown family "${family}"; expected one of ${FAMILIES.join(', ')}`);
  }
  return FITTERS[family as Family](x);
}
