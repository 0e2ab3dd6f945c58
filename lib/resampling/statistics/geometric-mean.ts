import * as z from 'zod/mini';
import { EngineError } from '../errors';
import { columnName } from './fields';
import { defineStatistic } from './types';
import { onesCounts, weightedMean } from './weighted-sums';

/**
 * Geometric mean exp(Σ ln xᵢ / n), defined for positive values only (other values are an
 * input error naming the row). Logs are taken once; a resample averages them with counts.
 * Cost O(n) per resample. Example: geometric mean of [1, 10, 100] = 10.
 */
const schema = z.strictObject({ name: z.literal('geometric-mean'), column: columnName });

export const geometricMean = defineStatistic({
  name: 'geometric-mean',
  schema,
  numericColumns: (s) => [{ role: 'x', column: s.column, path: 'statistic.column' }],
  describe: (s) => `geometric mean of ${s.column}`,
  minUnits: 2,
  validate(data, s, where) {
    const x = data.values.x;
    for (let i = 0; i < data.n; i++) {
      if (!(x[i] > 0)) {
        throw new EngineError('invalid:data', `the geometric mean needs positive values; ${s.column} has ${x[i]}`, where('x', i));
      }
    }
  },
  prepare(data) {
    const n = data.n;
    const logs = new Float64Array(n);
    for (let i = 0; i < n; i++) logs[i] = Math.log(data.values.x[i]);
    return {
      n,
      estimate: Math.exp(weightedMean(logs, onesCounts(n), n)),
      fromCounts: (counts, total) => Math.exp(weightedMean(logs, counts, total)),
    };
  },
});
