import type { Diagnostic } from './types';

/**
 * Small samples: with fewer than 10 values (in a group), bootstrap intervals are too narrow
 * on average — the resamples cannot show more variety than the sample (Efron & Tibshirani
 * 1993, §13.7; the threshold is common practice, not a theorem).
 */
export const SMALL_N = 10;

export const smallSample: Diagnostic = ({ problem }) => {
  const sizes = problem.groupSizes ?? [problem.n];
  const smallest = Math.min(...sizes);
  if (smallest >= SMALL_N) return null;
  const where = problem.groupSizes ? `the smaller group has only ${smallest} values` : `only ${smallest} values`;
  return {
    code: 'small-n',
    message: `Small sample: ${where}. Bootstrap intervals tend to be too narrow for samples this small; treat them as rough, and prefer the exact answer where one is given.`,
  };
};
