import { en } from 'zod/locales';
import * as z from 'zod/mini';
import { schemeSchema } from '../schemes/registry';
import { statisticSchema } from '../statistics/registry';
import { testSchema } from '../hypothesis/test-schema';

// zod/mini rather than zod's classic API: its schemas are plain objects without a method
// per check attached to each, which made building the engine's ~30 schemas the larger part of
// the command line's engine load (~15 → ~4 ms for a set of this size here), and its bundle a
// quarter of the size. It loads no locale of its own: the English messages, as zod's
// classic API sets them, for the fields whose message is not the engine's own.
z.config(en());

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

export const dataSchema = z.record(z.string().check(z.minLength(1, 'column names must not be empty')), column, {
  error: 'data must be an object of columns, e.g. { "x": [1.2, 3.4] }',
});

export const studentizedSchema = z.strictObject({
  /** Inner SE for each replicate: the jackknife of the resample, or a nested bootstrap. */
  se: z._default(z.enum(['jackknife', 'bootstrap'], { error: 'studentized.se must be jackknife or bootstrap' }), 'jackknife'),
  /** Replicates of the nested bootstrap for each outer replicate. */
  innerB: z._default(z.number().check(z.int('innerB must be a whole number'), z.gte(10, 'innerB must be at least 10'), z.lte(1000, 'innerB must be at most 1000')), 50),
});

export const intervalsSchema = z.strictObject({
  level: z._default(
    z.number({ error: 'level must be a number between 0 and 1, e.g. 0.95' }).check(z.gt(0, 'level must be between 0 and 1, e.g. 0.95'), z.lt(1, 'level must be between 0 and 1, e.g. 0.95')),
    0.95,
  ),
  methods: z.pipe(
    z._default(z.array(z.enum(INTERVAL_METHODS, { error: `interval methods are ${INTERVAL_METHODS.join(', ')}` })).check(z.maxLength(INTERVAL_METHODS.length)), ['percentile']),
    z.transform((m: IntervalMethod[]) => [...new Set(m)]),
  ),
  studentized: z._default(studentizedSchema, { se: 'jackknife', innerB: 50 }),
});

export const engineRequestSchema = z.strictObject({
  data: dataSchema,
  statistic: statisticSchema,
  scheme: z._default(schemeSchema, { name: 'ordinary' }),
  B: z._default(z.number({ error: 'B must be a whole number of replicates, e.g. 2000' }).check(z.int('B must be a whole number'), z.gte(10, 'B must be at least 10')), 2000),
  seed: z._default(
    z.pipe(
      z.union([z.string().check(z.maxLength(200, 'seed must be at most 200 characters')), z.number().check(z.int('a numeric seed must be a whole number'))], { error: 'seed must be a string or a whole number' }),
      z.transform(String),
    ),
    'margin',
  ),
  intervals: z._default(intervalsSchema, { level: 0.95, methods: ['percentile'], studentized: { se: 'jackknife', innerB: 50 } }),
  include: z.pipe(
    z._default(z.array(z.enum(INCLUDE_PARTS, { error: `include may list ${INCLUDE_PARTS.join(', ')}` })), []),
    z.transform((m: (typeof INCLUDE_PARTS)[number][]) => [...new Set(m)]),
  ),
  /** A hypothesis test to run beside the bootstrap (permutation, bootstrap-mean): hypothesis/test-schema.ts. */
  test: z.optional(testSchema),
});

export type EngineRequest = z.output<typeof engineRequestSchema>;
export type EngineRequestInput = z.input<typeof engineRequestSchema>;
