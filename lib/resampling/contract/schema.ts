import * as z from 'zod';
import { schemeSchema } from '../schemes/registry';
import { statisticSchema } from '../statistics/registry';
import { testSchema } from '../hypothesis/test-schema';

/**
 * The engine's request (see PRODUCT.md, "The engine's request and response"). Limits on
 * work (B, n·B) are checked after parsing, with codes of their own (`limit:*`).
 */
export const INTERVAL_METHODS = ['normal', 'basic', 'percentile', 'bca', 'studentized'] as const;
export type IntervalMethod = (typeof INTERVAL_METHODS)[number];

export const INCLUDE_PARTS = ['replicates', 'convergence', 'jackknife'] as const;

/**
 * A data column: a list of cells — numbers (non-finite numbers count as missing), text labels,
 * or null. Cells are checked where the columns are read (engine/prepare.ts), which names the
 * row at fault (`data.x[3]`) and costs one pass instead of a schema check per cell. Only the
 * list itself is checked here: z.array(z.unknown()) would still visit and copy every cell
 * (about 15 ms for 10⁴ cells on a cold start of the command line), for nothing.
 */
const column = z.custom<unknown[]>((v) => Array.isArray(v), { error: 'each column must be a list of values' });

export const dataSchema = z.record(z.string().min(1, 'column names must not be empty'), column, {
  error: 'data must be an object of columns, e.g. { "x": [1.2, 3.4] }',
});

export const studentizedSchema = z.strictObject({
  /** Inner SE for each replicate: the jackknife of the resample, or a nested bootstrap. */
  se: z.enum(['jackknife', 'bootstrap'], { error: 'studentized.se must be jackknife or bootstrap' }).default('jackknife'),
  /** Replicates of the nested bootstrap for each outer replicate. */
  innerB: z.number().int('innerB must be a whole number').min(10, 'innerB must be at least 10').max(1000, 'innerB must be at most 1000').default(50),
});

export const intervalsSchema = z.strictObject({
  level: z
    .number({ error: 'level must be a number between 0 and 1, e.g. 0.95' })
    .gt(0, 'level must be between 0 and 1, e.g. 0.95')
    .lt(1, 'level must be between 0 and 1, e.g. 0.95')
    .default(0.95),
  methods: z
    .array(z.enum(INTERVAL_METHODS, { error: `interval methods are ${INTERVAL_METHODS.join(', ')}` }))
    .max(INTERVAL_METHODS.length)
    .default(['percentile'])
    .transform((m) => [...new Set(m)]),
  studentized: studentizedSchema.default({ se: 'jackknife', innerB: 50 }),
});

export const engineRequestSchema = z.strictObject({
  data: dataSchema,
  statistic: statisticSchema,
  scheme: schemeSchema.default({ name: 'ordinary' }),
  B: z.number({ error: 'B must be a whole number of replicates, e.g. 2000' }).int('B must be a whole number').min(10, 'B must be at least 10').default(2000),
  seed: z
    .union([z.string().max(200, 'seed must be at most 200 characters'), z.number().int('a numeric seed must be a whole number')], { error: 'seed must be a string or a whole number' })
    .transform(String)
    .default('margin'),
  intervals: intervalsSchema.default({ level: 0.95, methods: ['percentile'], studentized: { se: 'jackknife', innerB: 50 } }),
  include: z
    .array(z.enum(INCLUDE_PARTS, { error: `include may list ${INCLUDE_PARTS.join(', ')}` }))
    .default([])
    .transform((m) => [...new Set(m)]),
  /** A hypothesis test to run beside the bootstrap (permutation, bootstrap-mean): hypothesis/test-schema.ts. */
  test: testSchema.optional(),
});

export type EngineRequest = z.output<typeof engineRequestSchema>;
export type EngineRequestInput = z.input<typeof engineRequestSchema>;
