import { loadSeries } from '../math/series';

/**
 * Mean of a series for the autocovariances (autocovariance.ts, lag1-autocorrelation.ts): the
 * plain sum in row order divided by n, after checking every value is finite.
 * Throws RangeError naming the first value (1-based) that is not.
 */
export function seriesMean(x: ArrayLike<number>): number {
  const n = x.length;
  // In WebAssembly from SERIES_WASM_MIN values up (math/series.ts): the same sum.
  const w = loadSeries(x)?.finiteSum();
  if (w) {
    if ('notFinite' in w) throw notFinite(w.notFinite);
    return w.sum / n;
  }
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const v = x[i];
    if (!Number.isFinite(v)) throw notFinite(i);
    sum += v;
  }
  return sum / n;
}

function notFinite(i: number): RangeError {
  return new RangeError(`autocovariance: value ${i + 1} is not a finite number`);
}
