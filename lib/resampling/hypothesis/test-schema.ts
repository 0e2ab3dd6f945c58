import * as z from 'zod/mini';

/**
 * Hypothesis tests a request may add (PRODUCT.md: `"test": { "name": "permutation", … }`):
 * - permutation: two-group statistics; exact when C(n1 + n2, n1) ≤ 200,000, else B draws.
 * - bootstrap-mean: H₀ mean = nullValue, for the mean statistic (Efron & Tibshirani 1993,
 *   Algorithm 16.2).
 */
const alternative = z._default(z.enum(['two-sided', 'less', 'greater'], { error: 'test.alternative must be two-sided, less or greater' }), 'two-sided');

export const testSchema = z.discriminatedUnion(
  'name',
  [
    z.strictObject({ name: z.literal('permutation'), alternative }),
    z.strictObject({
      name: z.literal('bootstrap-mean'),
      nullValue: z.number({ error: 'test.nullValue must be a number (the mean under the null hypothesis)' }).check(z.refine(Number.isFinite, 'test.nullValue must be finite')),
      alternative,
    }),
  ],
  { error: 'test.name must be permutation or bootstrap-mean' },
);

export type TestSettings = z.output<typeof testSchema>;
export const TEST_NAMES = ['permutation', 'bootstrap-mean'] as const;
