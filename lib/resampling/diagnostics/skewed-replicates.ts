import type { Diagnostic } from './types';

/**
 * Skewed replicates: when |skewness| of the replicates exceeds 0.5 the normal interval
 * (and to a lesser degree the basic one) misplaces its end points; BCa corrects for bias and
 * skewness (Efron 1987; Efron & Tibshirani 1993, ch. 14). The 0.5 threshold is common
 * practice for "moderately skewed".
 */
export const SKEW_THRESHOLD = 0.5;

export const skewedReplicates: Diagnostic = ({ moments, methods }) => {
  if (!moments || !Number.isFinite(moments.skewness) || Math.abs(moments.skewness) <= SKEW_THRESHOLD) return null;
  const side = moments.skewness > 0 ? 'right' : 'left';
  const usesSymmetric = methods.filter((m) => m === 'normal' || m === 'basic');
  return {
    code: 'skewed-replicates',
    message: `The replicates are skewed to the ${side} (skewness ${moments.skewness.toFixed(2)}). ${usesSymmetric.length ? `The ${usesSymmetric.join(' and ')} interval${usesSymmetric.length > 1 ? 's' : ''} may be misplaced; ` : ''}prefer the BCa interval.`,
  };
};
