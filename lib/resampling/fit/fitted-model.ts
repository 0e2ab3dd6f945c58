/** The distribution families the parametric bootstrap can fit. */
export const FAMILIES = ['normal', 'exponential', 'lognormal', 'poisson'] as const;
export type Family = (typeof FAMILIES)[number];

/**
 * A fitted model: its family, the maximum-likelihood parameters (named as R's
 * d/p/q/r functions name them: mean/sd, rate, meanlog/sdlog, lambda), the maximised
 * log-likelihood, and the sample size it was fitted to.
 */
export interface FittedModel {
  family: Family;
  parameters: Record<string, number>;
  logLikelihood: number;
  n: number;
}
