import { logGamma } from '../math/log-gamma';
import type { PreparedStatistic } from '../statistics/types';
import { distinctResamples } from './distinct-resamples';

/**
 * The ideal bootstrap by full enumeration (Fisher, N. I. & Hall, P. (1991), "Bootstrap
 * algorithms for small samples", Journal of Statistical Planning and Inference 27:
 * 157–169): every distinct resample — every composition (c₁…c_m) of m into m counts, in each
 * stratum — with its multinomial probability m! / (∏cᵢ! · m^m), the product over strata.
 * Moments are exact up to rounding. Used when the number of distinct resamples,
 * ∏ C(2mₛ − 1, mₛ), is at most `limit` (200,000 by default).
 */
export const ENUMERATION_LIMIT = 200_000;

export function enumerationSize(strata: readonly Int32Array[]): number {
  let total = 1;
  for (const s of strata) total *= distinctResamples(s.length);
  return total;
}

export interface Enumerated {
  values: Float64Array;
  weights: Float64Array;
}

/** Visits every distinct resample; returns statistic values and probabilities (Σ = 1). */
export function enumerateResamples(statistic: PreparedStatistic, strata: readonly Int32Array[], limit = ENUMERATION_LIMIT): Enumerated | null {
  const size = enumerationSize(strata);
  if (size > limit) return null;
  const n = statistic.n;
  const counts = new Int32Array(n);
  const values = new Float64Array(size);
  const weights = new Float64Array(size);
  const logFact = new Float64Array(n + 1);
  for (let k = 2; k <= n; k++) logFact[k] = logFact[k - 1] + Math.log(k);
  let visited = 0;
  const base = strata.reduce((acc, s) => acc + logGamma(s.length + 1) - s.length * Math.log(s.length), 0);

  const visit = (logW: number) => {
    values[visited] = statistic.fromCounts(counts, n);
    weights[visited] = Math.exp(base + logW);
    visited++;
  };

  const walkStratum = (s: number, logW: number): void => {
    if (s === strata.length) {
      visit(logW);
      return;
    }
    const units = strata[s];
    const m = units.length;
    const fill = (pos: number, remaining: number, lw: number): void => {
      const i = units[pos];
      if (pos === m - 1) {
        counts[i] = remaining;
        walkStratum(s + 1, lw - logFact[remaining]);
        counts[i] = 0;
        return;
      }
      for (let c = remaining; c >= 0; c--) {
        counts[i] = c;
        fill(pos + 1, remaining - c, lw - logFact[c]);
      }
      counts[i] = 0;
    };
    fill(0, m, logW);
  };
  walkStratum(0, 0);
  return { values, weights };
}

/** Exact SE (divisor: the probabilities) and bias of the enumerated distribution; NaN if any value is undefined. */
export function enumeratedMoments(e: Enumerated, estimate: number): { se: number; bias: number } {
  let mean = 0;
  let wsum = 0;
  for (let i = 0; i < e.values.length; i++) {
    mean += e.weights[i] * e.values[i];
    wsum += e.weights[i];
  }
  mean /= wsum;
  let v = 0;
  for (let i = 0; i < e.values.length; i++) v += e.weights[i] * (e.values[i] - mean) ** 2;
  return { se: Math.sqrt(v / wsum), bias: mean - estimate };
}
