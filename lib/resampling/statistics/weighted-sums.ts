/**
 * Weighted first and second moments of one or two columns under unit counts, in two passes
 * (means first, then centred sums) for accuracy. Shared by the mean, variance, correlation
 * and regression statistics. Cost O(n).
 */
export interface PairSums {
  total: number;
  meanX: number;
  meanY: number;
  sxx: number;
  syy: number;
  sxy: number;
}

const out: PairSums = { total: 0, meanX: 0, meanY: 0, sxx: 0, syy: 0, sxy: 0 };

export function weightedMean(x: Float64Array, counts: Int32Array, total: number): number {
  let s = 0;
  for (let i = 0; i < x.length; i++) s += counts[i] * x[i];
  return s / total;
}

/** Σc(x − x̄)² with x̄ the weighted mean. */
export function weightedSumSquares(x: Float64Array, counts: Int32Array, total: number): { mean: number; ss: number } {
  const mean = weightedMean(x, counts, total);
  let ss = 0;
  for (let i = 0; i < x.length; i++) {
    const c = counts[i];
    if (c !== 0) {
      const d = x[i] - mean;
      ss += c * d * d;
    }
  }
  return { mean, ss };
}

export function weightedPairSums(x: Float64Array, y: Float64Array, counts: Int32Array, total: number): PairSums {
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < x.length; i++) {
    const c = counts[i];
    sx += c * x[i];
    sy += c * y[i];
  }
  const mx = sx / total;
  const my = sy / total;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < x.length; i++) {
    const c = counts[i];
    if (c !== 0) {
      const dx = x[i] - mx;
      const dy = y[i] - my;
      sxx += c * dx * dx;
      syy += c * dy * dy;
      sxy += c * dx * dy;
    }
  }
  out.total = total;
  out.meanX = mx;
  out.meanY = my;
  out.sxx = sxx;
  out.syy = syy;
  out.sxy = sxy;
  return out;
}

/** All-ones counts of length n (the observed sample). */
export function onesCounts(n: number): Int32Array {
  return new Int32Array(n).fill(1);
}
