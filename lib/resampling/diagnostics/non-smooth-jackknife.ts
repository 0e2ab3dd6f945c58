import type { Diagnostic } from './types';

/**
 * The jackknife is inconsistent for non-smooth statistics such as the median: its
 * leave-one-out values take only two or three distinct values (Efron & Tibshirani 1993,
 * §11.6; Efron, B. (1982), The Jackknife, the Bootstrap and Other Resampling Plans, §3.4).
 * BCa's acceleration and a studentized interval with jackknife inner SEs inherit that.
 */
export const nonSmoothJackknife: Diagnostic = ({ problem, methods }) => {
  if (!problem.statisticDef.nonSmooth) return null;
  const stud = methods.includes('studentized') && problem.request.intervals.studentized.se === 'jackknife';
  const uses = [methods.includes('bca') ? 'the BCa acceleration' : null, stud ? 'the studentized interval (jackknife inner SE)' : null, problem.request.include.includes('jackknife') ? 'the jackknife output' : null].filter(Boolean);
  if (!uses.length) return null;
  return {
    code: 'jackknife-non-smooth',
    message: `The jackknife is unreliable for the ${problem.description} (a non-smooth statistic), which affects ${uses.join(', ')}.${stud ? ' For the studentized interval choose the nested bootstrap inner SE (studentized.se = "bootstrap").' : ''}`,
  };
};
