import type { Rng } from '../random/rng';
import { uniformIndex } from '../random/uniform-index';
import type { PreparedStatistic } from '../statistics/types';

/**
 * Inner standard errors for the studentized interval, computed on one resample given as
 * unit counts.
 *
 * Jackknife of the resample (Efron & Tibshirani 1993, §12.5 suggest the jackknife or a
 * nested bootstrap for the SE of each replicate): each of the m = Σc observations is left out
 * in turn — unit i's cᵢ copies give the same value θ₍ᵢ₎, so it is computed once and weighted
 * by cᵢ — and within each stratum s
 *
 *   SE² = Σₛ (mₛ − 1)/mₛ · Σ_{i∈s} cᵢ (θ₍ᵢ₎ − θ̄ₛ)²,  θ̄ₛ = Σ cᵢθ₍ᵢ₎ / mₛ.
 *
 * Cost: one evaluation per distinct unit in the resample (about 0.63 n).
 */
export function jackknifeSeOfResample(statistic: PreparedStatistic, strata: readonly Int32Array[], counts: Int32Array, total: number, scratch: Float64Array): number {
  let variance = 0;
  for (const units of strata) {
    let m = 0;
    for (let k = 0; k < units.length; k++) m += counts[units[k]];
    if (m < 2) continue;
    // Deviations are taken from the first value so that equal values give exactly 0.
    let mean = 0;
    let ref = Number.NaN;
    for (let k = 0; k < units.length; k++) {
      const i = units[k];
      const c = counts[i];
      if (c === 0) continue;
      counts[i] = c - 1;
      const v = statistic.fromCounts(counts, total - 1);
      counts[i] = c;
      if (Number.isNaN(ref)) ref = v;
      scratch[i] = v - ref;
      mean += c * (v - ref);
    }
    mean /= m;
    let ss = 0;
    for (let k = 0; k < units.length; k++) {
      const i = units[k];
      const c = counts[i];
      if (c === 0) continue;
      const d = scratch[i] - mean;
      ss += c * d * d;
    }
    variance += ((m - 1) / m) * ss;
  }
  return Math.sqrt(variance);
}

/**
 * Nested bootstrap SE of one resample: `innerB` resamples drawn from the resample itself
 * (within the same strata), SD of their statistics with the innerB − 1 divisor
 * (Davison & Hinkley 1997, §5.2.1, "double bootstrap" variance estimate).
 * Cost: innerB·(n draws + one evaluation).
 */
export function bootstrapSeOfResample(
  statistic: PreparedStatistic,
  strata: readonly Int32Array[],
  counts: Int32Array,
  total: number,
  innerB: number,
  rng: Rng,
  pool: Int32Array,
  inner: Int32Array,
): number {
  let sum = 0;
  let sum2 = 0;
  let finite = 0;
  const values: number[] = [];
  for (let b = 0; b < innerB; b++) {
    inner.fill(0);
    for (const units of strata) {
      let m = 0;
      for (let k = 0; k < units.length; k++) {
        const i = units[k];
        for (let c = counts[i]; c > 0; c--) pool[m++] = i;
      }
      for (let k = 0; k < m; k++) inner[pool[uniformIndex(rng, m)]]++;
    }
    const v = statistic.fromCounts(inner, total);
    if (Number.isFinite(v)) {
      values.push(v);
      sum += v;
      finite++;
    }
  }
  if (finite < 2) return Number.NaN;
  const mean = sum / finite;
  for (const v of values) sum2 += (v - mean) * (v - mean);
  return Math.sqrt(sum2 / (finite - 1));
}
