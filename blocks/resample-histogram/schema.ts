import { z } from 'zod';

/**
 * Resample histogram: the bootstrap replicates of a linked Estimate block, with θ̂ and the
 * interval marked, an optional fitted normal curve and an optional normal quantile plot.
 * Only display options live here; the run settings are the Estimate's.
 */
export const histogramAttrs = z.object({
  source: z.string().min(1).max(64).nullable(),
  bins: z.number().int('bins must be a whole number').min(5, 'at least 5 bins').max(200, 'at most 200 bins'),
  normalCurve: z.boolean(),
  qqPlot: z.boolean(),
  method: z.enum(['normal', 'basic', 'percentile', 'bca', 'studentized']).nullable(),
});
export type HistogramAttrs = z.infer<typeof histogramAttrs>;
