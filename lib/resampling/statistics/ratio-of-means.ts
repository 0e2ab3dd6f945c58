import * as z from 'zod/mini';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Ratio of means x̄_num / x̄_den = Σ numᵢ / Σ denᵢ over the same rows (the ratio estimator;
 * Davison, A. C. & Hinkley, D. V. (1997), Bootstrap Methods and their Application,
 * Cambridge University Press, Example 2.8, the city population data). Undefined when the
 * denominator's mean is 0. Cost O(n) per resample. Example: num [1, 2], den [2, 2] → 0.75.
 */
const schema = z.strictObject({ name: z.literal('ratio-of-means'), numerator: columnName, denominator: columnName });

function ratio(u: Float64Array, v: Float64Array, counts: Int32Array): number {
  let su = 0;
  let sv = 0;
  for (let i = 0; i < u.length; i++) {
    const c = counts[i];
    su += c * u[i];
    sv += c * v[i];
  }
  return sv === 0 ? Number.NaN : su / sv;
}

export const ratioOfMeans = defineStatistic({
  name: 'ratio-of-means',
  schema,
  numericColumns: (s) => [
    { role: 'numerator', column: s.numerator, path: 'statistic.numerator' },
    { role: 'denominator', column: s.denominator, path: 'statistic.denominator' },
  ],
  describe: (s) => `ratio of the means of ${s.numerator} and ${s.denominator}`,
  minUnits: 2,
  prepare(data) {
    const u = data.values.numerator;
    const v = data.values.denominator;
    return { n: data.n, estimate: ratio(u, v, onesCounts(data.n)), fromCounts: (c) => ratio(u, v, c) };
  },
});
