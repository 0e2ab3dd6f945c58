import * as z from 'zod/mini';
import { columnName } from './fields';
import { interceptFromCounts } from './regression';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Least-squares intercept of y on x, a = ȳ − b·x̄ (as coef(lm(y ~ x))[1] in R).
 * Cost O(n) per resample. Example: x = [1, 2, 3], y = [1, 3, 5] → −1.
 */
const schema = z.strictObject({ name: z.literal('regression-intercept'), x: columnName, y: columnName });

export const regressionIntercept = defineStatistic({
  name: 'regression-intercept',
  schema,
  numericColumns: (s) => [
    { role: 'x', column: s.x, path: 'statistic.x' },
    { role: 'y', column: s.y, path: 'statistic.y' },
  ],
  describe: (s) => `least-squares intercept of ${s.y} on ${s.x}`,
  minUnits: 3,
  prepare(data) {
    const { x, y } = data.values;
    return { n: data.n, estimate: interceptFromCounts(x, y, onesCounts(data.n), data.n), fromCounts: (c, t) => interceptFromCounts(x, y, c, t) };
  },
});
