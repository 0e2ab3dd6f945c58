import * as z from 'zod/mini';
import { columnName } from './fields';
import { slopeFromCounts } from './regression';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Least-squares slope of y on x, b = Σ(x − x̄)(y − ȳ) / Σ(x − x̄)² (as coef(lm(y ~ x))[2] in
 * R). Cost O(n) per resample. Example: x = [1, 2, 3], y = [1, 3, 5] → 2.
 */
const schema = z.strictObject({ name: z.literal('regression-slope'), x: columnName, y: columnName });

export const regressionSlope = defineStatistic({
  name: 'regression-slope',
  schema,
  numericColumns: (s) => [
    { role: 'x', column: s.x, path: 'statistic.x' },
    { role: 'y', column: s.y, path: 'statistic.y' },
  ],
  describe: (s) => `least-squares slope of ${s.y} on ${s.x}`,
  minUnits: 3,
  prepare(data) {
    const { x, y } = data.values;
    return { n: data.n, estimate: slopeFromCounts(x, y, onesCounts(data.n), data.n), fromCounts: (c, t) => slopeFromCounts(x, y, c, t) };
  },
});
