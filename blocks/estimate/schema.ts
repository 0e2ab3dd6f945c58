import { z } from 'zod';
import { datasetRef, intervalMethods, level, replicateCount, rowFilter, scheme, seed, statistic } from '../shared/settings';

/**
 * Estimate block: a statistic of a dataset's column(s) with its bootstrap standard error,
 * bias, confidence intervals and Monte Carlo error. `attrs` is what the node holds (the
 * dataset may not be chosen yet); `settings` is what a run is keyed on.
 */
export const estimateSettings = z.object({
  dataset: datasetRef,
  filter: rowFilter.nullable(),
  statistic,
  scheme,
  B: replicateCount,
  seed,
  level,
  methods: intervalMethods,
});
export type EstimateSettings = z.infer<typeof estimateSettings>;

export const estimateAttrs = estimateSettings.extend({ dataset: datasetRef.nullable() });
export type EstimateAttrs = z.infer<typeof estimateAttrs>;
