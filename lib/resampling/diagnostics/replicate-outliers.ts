import { quantileSorted } from '../math/quantile-sorted';
import type { Diagnostic } from './types';

/**
 * Far-out replicates: beyond Tukey's outer fences Q1 − 3·IQR and Q3 + 3·IQR of the
 * replicates (Tukey, J. W. (1977), Exploratory Data Analysis). A few wild resamples (a ratio
 * with a denominator near 0, a variance driven by one value) inflate the SD of the
 * replicates; the robust SE IQR / 1.349 (IQR of a normal = 1.349σ) is then offered.
 */
export const replicateOutliers: Diagnostic = ({ sorted, robustSe }) => {
  const B = sorted.length;
  if (B < 20) return null;
  const q1 = quantileSorted(sorted, 0.25);
  const q3 = quantileSorted(sorted, 0.75);
  const iqr = q3 - q1;
  if (!(iqr > 0)) return null;
  const lo = q1 - 3 * iqr;
  const hi = q3 + 3 * iqr;
  let far = 0;
  for (let i = 0; i < B && sorted[i] < lo; i++) far++;
  for (let i = B - 1; i >= 0 && sorted[i] > hi; i--) far++;
  if (!far) return null;
  return {
    code: 'replicate-outliers',
    message: `${far} of ${B} replicates lie far outside the rest (beyond 3 IQR from the quartiles), which inflates the SE. A robust SE from the replicates' interquartile range is ${fmt(robustSe)}; prefer percentile or BCa intervals and look at the histogram.`,
  };
};

function fmt(x: number | null): string {
  return x === null ? 'not available' : Number(x.toPrecision(4)).toString();
}
