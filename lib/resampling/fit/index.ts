// Maximum-likelihood fits and samplers for the parametric bootstrap. Pure functions; the
// random source is passed in; no Node or DOM APIs.
export { FitError } from './fit-error';
export { FAMILIES, type Family, type FittedModel } from './fitted-model';
export { fitNormal } from './fit-normal';
export { fitExponential } from './fit-exponential';
export { fitLognormal } from './fit-lognormal';
export { fitPoisson } from './fit-poisson';
export { fitFamily } from './fit-family';
export { logFactorial } from './log-factorial';
export { fillNormal } from './sample-normal';
export { fillExponential } from './sample-exponential';
export { fillLognormal } from './sample-lognormal';
export { fillPoisson, poissonInversion, poissonPtrs, POISSON_INVERSION_LIMIT } from './sample-poisson';
export { simulate } from './simulate';
