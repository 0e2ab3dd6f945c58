import type { PreparedStatistic } from '../statistics/types';

/**
 * Jackknife of the observed data (Quenouille 1949; Tukey 1958; Efron & Tibshirani 1993,
 * ch. 11), within strata when there are several (Davison & Hinkley 1997, §3.2.1, §5.3.2):
 *
 *   θ₍ᵢ₎      the statistic with unit i left out; θ̄ₛ their mean over stratum s (size nₛ)
 *   SE²       = Σₛ (nₛ − 1)/nₛ · Σ_{i∈s} (θ₍ᵢ₎ − θ̄ₛ)²
 *   bias      = Σₛ (nₛ − 1)(θ̄ₛ − θ̂)
 *   influence lᵢ = (nₛ − 1)(θ̄ₛ − θ₍ᵢ₎)          (empirical influence values)
 *   pseudo    = nₛθ̂ − (nₛ − 1)θ₍ᵢ₎
 *   a         = (1/6) Σₛ nₛ⁻³ Σ lᵢ³ / (Σₛ nₛ⁻² Σ lᵢ²)^{3/2}    (BCa acceleration; with one
 *               stratum Σl³ / (6(Σl²)^{3/2}), Efron 1987 eq. 6.6)
 *
 * Leave-one-out values come from the statistic's fast path when it has one, else from
 * fromCounts with one count set to 0: cost n evaluations, O(n²) for most statistics.
 * Strata of one unit contribute nothing. Undefined results are NaN (callers map to null).
 */
export interface JackknifeOutcome {
  values: Float64Array;
  se: number;
  bias: number;
  influence: Float64Array;
  pseudoValues: Float64Array;
  acceleration: number;
}

export function jackknife(statistic: PreparedStatistic, strata: readonly Int32Array[], shouldStop?: () => boolean): JackknifeOutcome {
  const n = statistic.n;
  const values = leaveOneOutValues(statistic, shouldStop);
  const theta = statistic.estimate;
  const influence = new Float64Array(n);
  const pseudoValues = new Float64Array(n);
  let variance = 0;
  let bias = 0;
  let s2 = 0;
  let s3 = 0;
  for (const units of strata) {
    const m = units.length;
    if (m < 2) continue;
    // Sums are shifted by the first value so that equal values give exactly zero spread.
    const ref = values[units[0]];
    let shifted = 0;
    for (let k = 0; k < m; k++) shifted += values[units[k]] - ref;
    shifted /= m;
    const mean = ref + shifted;
    let ss = 0;
    let l2 = 0;
    let l3 = 0;
    for (let k = 0; k < m; k++) {
      const i = units[k];
      const d = values[i] - ref - shifted;
      ss += d * d;
      const l = -(m - 1) * d;
      influence[i] = l;
      pseudoValues[i] = m * theta - (m - 1) * values[i];
      l2 += l * l;
      l3 += l * l * l;
    }
    variance += ((m - 1) / m) * ss;
    bias += (m - 1) * (mean - theta);
    s2 += l2 / (m * m);
    s3 += l3 / (m * m * m);
  }
  const acceleration = s2 > 0 ? s3 / (6 * Math.pow(s2, 1.5)) : Number.NaN;
  return { values, se: Math.sqrt(variance), bias, influence, pseudoValues, acceleration };
}

export function leaveOneOutValues(statistic: PreparedStatistic, shouldStop?: () => boolean): Float64Array {
  if (statistic.leaveOneOut) return statistic.leaveOneOut();
  const n = statistic.n;
  const counts = new Int32Array(n).fill(1);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (shouldStop && (i & 1023) === 0 && shouldStop()) break;
    counts[i] = 0;
    out[i] = statistic.fromCounts(counts, n - 1);
    counts[i] = 1;
  }
  return out;
}
