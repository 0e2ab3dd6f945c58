import { weightedPairSums } from './weighted-sums';

/**
 * Least-squares line y = a + b·x with case weights (the resample counts):
 * b = Σc(x − x̄)(y − ȳ) / Σc(x − x̄)², a = ȳ − b·x̄. Undefined (NaN) when the resample
 * has no spread in x. Resampling whole (x, y) cases is "case resampling" (Davison &
 * Hinkley 1997, §6.2.4); residual resampling is a separate scheme.
 */
export function slopeFromCounts(x: Float64Array, y: Float64Array, counts: Int32Array, total: number): number {
  const s = weightedPairSums(x, y, counts, total);
  return s.sxx > 0 ? s.sxy / s.sxx : Number.NaN;
}

export function interceptFromCounts(x: Float64Array, y: Float64Array, counts: Int32Array, total: number): number {
  const s = weightedPairSums(x, y, counts, total);
  return s.sxx > 0 ? s.meanY - (s.sxy / s.sxx) * s.meanX : Number.NaN;
}
