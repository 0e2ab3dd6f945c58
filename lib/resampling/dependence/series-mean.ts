/**
 * Mean of a series for the autocovariances (autocovariance.ts, lag1-autocorrelation.ts): the
 * plain sum in row order divided by n, after checking every value is finite.
 * Throws RangeError naming the first value (1-based) that is not.
 */
export function seriesMean(x: ArrayLike<number>): number {
  const n = x.length;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const v = x[i];
    if (!Number.isFinite(v)) throw new RangeError(`autocovariance: value ${i + 1} is not a finite number`);
    sum += v;
  }
  return sum / n;
}
