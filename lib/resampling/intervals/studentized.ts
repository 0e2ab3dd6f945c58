import { quantileMonteCarloError } from '../montecarlo/quantile-error';
import { orderStatisticQuantile, usesExtremeOrderStatistic } from './order-statistic';
import { type IntervalInput, type IntervalOutcome, tails } from './types';

/**
 * Studentized (bootstrap-t) interval: with t*_b = (θ*_b − θ̂) / se*_b and se*_b an inner SE
 * of replicate b (jackknife of the resample, or a nested bootstrap),
 *
 *   (θ̂ − se₀ · t*₁₋α/₂, θ̂ − se₀ · t*α/₂),
 *
 * se₀ the same inner SE on the observed data (Efron & Tibshirani 1993 ch. 12; Davison &
 * Hinkley 1997 eq. (5.7)), quantiles of t* by the order-statistic rule, as R boot's stud.ci.
 * Replicates whose inner SE is 0 or undefined give no t* and are left out.
 */
export function studentizedInterval(input: IntervalInput): IntervalOutcome | null {
  const st = input.studentized;
  if (!st || st.sortedT.length < 2 || !(st.se0 > 0)) return null;
  const [a1, a2] = tails(input.level);
  const t = st.sortedT;
  return {
    lower: input.estimate - st.se0 * orderStatisticQuantile(t, a2),
    upper: input.estimate - st.se0 * orderStatisticQuantile(t, a1),
    lowerMonteCarloError: st.se0 * quantileMonteCarloError(t, a2),
    upperMonteCarloError: st.se0 * quantileMonteCarloError(t, a1),
    extreme: usesExtremeOrderStatistic(t.length, a1) || usesExtremeOrderStatistic(t.length, a2),
  };
}
