import type { Diagnostic } from './types';

/**
 * Regression: say which resampling was used and when the other fits better. Resampling
 * cases (rows, the ordinary scheme) treats x as random and is robust to unequal error
 * variance; resampling residuals (the residual scheme) keeps x fixed as in a designed
 * experiment and assumes errors of equal variance (Efron & Tibshirani 1993, §9.5;
 * Davison & Hinkley 1997, §6.2.4).
 */
export const regressionDesign: Diagnostic = ({ problem }) => {
  const stat = problem.request.statistic.name;
  if (stat !== 'regression-slope' && stat !== 'regression-intercept') return null;
  const scheme = problem.request.scheme.name;
  if (scheme === 'residual') {
    return {
      code: 'regression-residual',
      message: 'Residuals were resampled with x held fixed (a fixed design). This assumes errors of equal variance at every x; if the spread changes with x, resample cases instead (the ordinary scheme).',
    };
  }
  if (scheme === 'ordinary' || scheme === 'stratified') {
    return {
      code: 'regression-cases',
      message: 'Cases (rows) were resampled, which treats x as random. If x was fixed by design (set doses, times, positions), the residual scheme keeps it fixed and resamples residuals instead.',
    };
  }
  return null;
};
