import * as z from 'zod/mini';
import { quantileFromCounts } from './count-scan';
import { columnName } from './fields';
import { sortUnits } from './sort-units';
import { defineStatistic } from './types';
import { onesCounts } from './weighted-sums';

/**
 * Quantile Q(p), Hyndman–Fan type 7 (R's default): h = (n − 1)p, Q = (1 − f)x₍⌊h⌋+1₎ +
 * f·x₍⌊h⌋+2₎ in 1-based order statistics, f = h − ⌊h⌋ (Hyndman, R. J. & Fan, Y. (1996),
 * The American Statistician 50: 361–365). p = 0 and p = 1 are the sample minimum and
 * maximum, which the bootstrap estimates badly (Bickel, P. J. & Freedman, D. A. (1981),
 * Annals of Statistics 9: 1196–1217): the engine warns. When h is a whole number the
 * quantile is one order statistic and has an exact bootstrap distribution.
 * Cost O(n) per resample. Example: quantile p = 0.25 of [1, 2, 3, 4, 5] = 2.
 */
const schema = z.strictObject({
  name: z.literal('quantile'),
  column: columnName,
  p: z.number({ error: 'p must be a number between 0 and 1' }).check(z.gte(0, 'p must be between 0 and 1'), z.lte(1, 'p must be between 0 and 1')),
});

export const quantile = defineStatistic({
  name: 'quantile',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `${s.p} quantile of ${s.column}`,
  minUnits: 2,
  nonSmooth: true,
  isExtreme: (s, n) => s.p * (n - 1) < 1 || s.p * (n - 1) > n - 2,
  prepare(data, s) {
    const { sorted, order } = sortUnits(data.values.x);
    const n = data.n;
    const h = (n - 1) * s.p;
    return {
      n,
      estimate: quantileFromCounts(sorted, order, onesCounts(n), n, s.p),
      fromCounts: (counts, total) => quantileFromCounts(sorted, order, counts, total, s.p),
      countsQuantile: { sorted, order, p: s.p },
      orderStatistic: Number.isInteger(h) ? { sorted, rank: h + 1 } : undefined,
    };
  },
});
