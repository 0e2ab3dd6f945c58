import { z } from 'zod';
import { columnName, datasetRef, level, replicateCount, seed, INTERVAL_METHODS } from '../shared/settings';

/**
 * Group comparison: two groups of one column side by side, each with its own statistic and
 * percentile interval, and the difference (first − second) with its interval from a
 * bootstrap that resamples within each group.
 */
export const groupComparisonSettings = z
  .object({
    dataset: datasetRef,
    value: columnName,
    group: columnName,
    levels: z.tuple([z.string().min(1, 'choose the first group'), z.string().min(1, 'choose the second group')]),
    statistic: z.enum(['mean', 'median']),
    B: replicateCount,
    seed,
    level,
    method: z.enum(INTERVAL_METHODS),
  })
  .refine((s) => s.levels[0] !== s.levels[1], { message: 'choose two different groups', path: ['levels', 1] })
  .refine((s) => s.value !== s.group, { message: 'the value column and the group column must differ', path: ['group'] });
export type GroupComparisonSettings = z.infer<typeof groupComparisonSettings>;

export const groupComparisonAttrs = z.object({
  dataset: datasetRef.nullable(),
  value: z.string().max(128),
  group: z.string().max(128),
  levels: z.tuple([z.string().max(200), z.string().max(200)]),
  statistic: z.enum(['mean', 'median']),
  B: z.number(),
  seed: z.string().max(64),
  level: z.number(),
  method: z.enum(INTERVAL_METHODS),
});
export type GroupComparisonAttrs = z.infer<typeof groupComparisonAttrs>;
