import { normalCdf } from '../math/normal-cdf';
import { normalQuantile } from '../math/normal-quantile';
import { lowerBound, upperBound } from '../statistics/lower-bound';
import { quantileMonteCarloError } from '../montecarlo/quantile-error';
import { orderStatisticQuantile, usesExtremeOrderStatistic } from './order-statistic';
import { type IntervalInput, type IntervalOutcome, tails } from './types';

/**
 * BCa interval (bias-corrected and accelerated; Efron, B. (1987), "Better bootstrap
 * confidence intervals", JASA 82: 171–185; Efron & Tibshirani 1993, ch. 14):
 *
 *   α̃ = Φ(z₀ + (z₀ + z_α) / (1 − a(z₀ + z_α)))   for z_α = Φ⁻¹(α/2), Φ⁻¹(1 − α/2),
 *
 * end points the α̃ quantiles of the replicates (order-statistic.ts). z₀ comes from the
 * replicates (see biasCorrection) and a = Σlᵢ³ / (6 (Σlᵢ²)^{3/2}) from the jackknife
 * influence values. Returns null when z₀ or a is undefined.
 */
export function bcaInterval(input: IntervalInput): IntervalOutcome | null {
  const { z0, acceleration: a } = input;
  if (z0 === null || a === null || !Number.isFinite(z0) || !Number.isFinite(a)) return null;
  const s = input.sorted;
  const [t1, t2] = tails(input.level);
  const adj = [t1, t2].map((t) => {
    const z = normalQuantile(t);
    return normalCdf(z0 + (z0 + z) / (1 - a * (z0 + z)));
  });
  if (!adj.every((v) => Number.isFinite(v))) return null;
  return {
    lower: orderStatisticQuantile(s, adj[0]),
    upper: orderStatisticQuantile(s, adj[1]),
    lowerMonteCarloError: quantileMonteCarloError(s, adj[0]),
    upperMonteCarloError: quantileMonteCarloError(s, adj[1]),
    extreme: usesExtremeOrderStatistic(s.length, adj[0]) || usesExtremeOrderStatistic(s.length, adj[1]),
  };
}

/**
 * Bias-correction z₀ = Φ⁻¹(p) with p the proportion of replicates below θ̂, ties with θ̂
 * counted as one half: p = (#{θ* < θ̂} + ½·#{θ* = θ̂}) / B. (Efron 1987 counts only
 * θ* < θ̂, as R's boot does; with discrete statistics such as a median many replicates
 * equal θ̂ and the strict count biases z₀ downward, so the engine uses mid-rank ties, as
 * scipy.stats.bootstrap does.) Null when p is 0 or 1 (every replicate on one side).
 */
export function biasCorrection(sorted: Float64Array, estimate: number): number | null {
  // Replicates below the estimate and equal to it, by two binary searches in the sorted
  // replicates (a scan up to the estimate cost a few ms per 10⁴ on a cold start).
  const below = lowerBound(sorted, estimate);
  const equal = upperBound(sorted, estimate) - below;
  const p = (below + 0.5 * equal) / sorted.length;
  if (p <= 0 || p >= 1) return null;
  return normalQuantile(p);
}
