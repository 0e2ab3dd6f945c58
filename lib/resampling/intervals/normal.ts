import { normalQuantile } from '../math/normal-quantile';
import { type IntervalInput, type IntervalOutcome, tails } from './types';

/**
 * Normal interval, bias-corrected: θ̂ − b ∓ z₁₋α/₂ · se with b = mean(θ*) − θ̂ and se the
 * replicates' SD (B − 1 divisor) — Davison & Hinkley (1997) eq. (5.5); the same as R boot's
 * norm.ci. Monte Carlo error of each end point: √(se²/B + z²·sd(ŝe)²), from the Monte Carlo
 * error of the replicates' mean (se/√B) and of their SD (treated as uncorrelated, which
 * holds for symmetric replicate distributions).
 */
export function normalInterval(input: IntervalInput): IntervalOutcome {
  const [, hi] = tails(input.level);
  const z = normalQuantile(hi);
  const bias = input.mean - input.estimate;
  const merr = input.se * z;
  const B = input.sorted.length;
  const mc = Math.sqrt((input.se * input.se) / B + z * z * input.seMonteCarloError * input.seMonteCarloError);
  return {
    lower: input.estimate - bias - merr,
    upper: input.estimate - bias + merr,
    lowerMonteCarloError: mc,
    upperMonteCarloError: mc,
    extreme: false,
  };
}
