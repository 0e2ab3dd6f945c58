import { MAX_UNIFORM_N } from '../random/uniform-index';

/**
 * Limits on work, checked before any resampling, each with its own error code. They allow
 * at least B = 100,000 and n·B = 10⁹ (about 5 s on two cores for a median).
 */
export const LIMITS = {
  /** Most replicates in one request. */
  maxB: 1_000_000,
  /** Most units (rows): exact uniform draws need n < 2²¹. */
  maxN: MAX_UNIFORM_N,
  /** Most index draws (n·B, times the inner work of a studentized interval). */
  maxDraws: 2_000_000_000,
  /** Most leave-one-out evaluation steps (n² for statistics without a fast jackknife). */
  maxJackknifeSteps: 1_000_000_000,
} as const;
