import type { Diagnostic } from './types';

/** Replicates on which the statistic was undefined (no spread, zero denominator …), left out. */
export const undefinedReplicates: Diagnostic = ({ nonFinite, B, problem }) => {
  if (!nonFinite) return null;
  return {
    code: 'non-finite-replicates',
    message: `The ${problem.description} was undefined on ${nonFinite} of ${B} resamples (for example a resample with no spread); they were left out, and results use the other ${B - nonFinite}.`,
  };
};
