import { quantileMonteCarloError } from '../montecarlo/quantile-error';
import { orderStatisticQuantile, usesExtremeOrderStatistic } from './order-statistic';
import { type IntervalInput, type IntervalOutcome, tails } from './types';

/**
 * Percentile interval: the α/2 and 1 − α/2 quantiles of the replicates (Efron 1979;
 * Davison & Hinkley 1997 eq. (5.18)), quantiles by the (B+1)α order-statistic rule with
 * normal-scale interpolation (order-statistic.ts), as R boot's perc.ci.
 */
export function percentileInterval(input: IntervalInput): IntervalOutcome {
  const [a1, a2] = tails(input.level);
  const s = input.sorted;
  return {
    lower: orderStatisticQuantile(s, a1),
    upper: orderStatisticQuantile(s, a2),
    lowerMonteCarloError: quantileMonteCarloError(s, a1),
    upperMonteCarloError: quantileMonteCarloError(s, a2),
    extreme: usesExtremeOrderStatistic(s.length, a1) || usesExtremeOrderStatistic(s.length, a2),
  };
}
