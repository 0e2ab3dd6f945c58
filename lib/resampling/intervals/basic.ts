import { quantileMonteCarloError } from '../montecarlo/quantile-error';
import { orderStatisticQuantile, usesExtremeOrderStatistic } from './order-statistic';
import { type IntervalInput, type IntervalOutcome, tails } from './types';

/**
 * Basic interval: (2θ̂ − t*₁₋α/₂, 2θ̂ − t*α/₂), reflecting the replicates' quantiles about
 * θ̂ (Davison & Hinkley 1997 eq. (5.6)), as R boot's basic.ci.
 */
export function basicInterval(input: IntervalInput): IntervalOutcome {
  const [a1, a2] = tails(input.level);
  const s = input.sorted;
  return {
    lower: 2 * input.estimate - orderStatisticQuantile(s, a2),
    upper: 2 * input.estimate - orderStatisticQuantile(s, a1),
    lowerMonteCarloError: quantileMonteCarloError(s, a2),
    upperMonteCarloError: quantileMonteCarloError(s, a1),
    extreme: usesExtremeOrderStatistic(s.length, a1) || usesExtremeOrderStatistic(s.length, a2),
  };
}
