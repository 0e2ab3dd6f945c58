import { z } from 'zod';

/**
 * Convergence plot: how the linked Estimate's SE and interval end points settle as B
 * grows, on a log axis, with a Monte Carlo error band around the SE.
 */
export const convergenceAttrs = z.object({
  source: z.string().min(1).max(64).nullable(),
  show: z.enum(['se', 'intervals', 'both']),
});
export type ConvergenceAttrs = z.infer<typeof convergenceAttrs>;
