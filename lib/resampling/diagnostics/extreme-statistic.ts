import type { Diagnostic } from './types';

/**
 * The bootstrap fails for the sample maximum and minimum (and quantiles next to them): the
 * resample maximum equals the sample maximum with probability 1 − (1 − 1/n)ⁿ → 1 − e⁻¹ ≈
 * 0.632, so the bootstrap distribution does not approach the true one (Bickel, P. J. &
 * Freedman, D. A. (1981), Annals of Statistics 9: 1196–1217; Efron & Tibshirani 1993, §7.4).
 */
export const extremeStatistic: Diagnostic = ({ problem }) => {
  const def = problem.statisticDef;
  if (!def.isExtreme?.(problem.request.statistic, problem.n)) return null;
  return {
    code: 'extreme-statistic',
    message: `The ${problem.description} is at or next to the sample minimum or maximum, which the bootstrap estimates badly (its resamples cannot go beyond the data). Do not rely on these intervals; consider a parametric model of the tail.`,
  };
};
