import * as z from 'zod/mini';
import { columnName } from '../statistics/fields';
import { countingScheme, strataFromKeys } from './counting';
import { defineScheme } from './types';

/**
 * Stratified bootstrap: rows are resampled with replacement within each stratum (each value
 * of the `by` column), so every resample keeps the strata sizes of the data (Davison &
 * Hinkley 1997, §3.2.1). With a two-group statistic the strata are (by × group).
 */
const schema = z.strictObject({ name: z.literal('stratified'), by: columnName });

export const stratified = defineScheme({
  name: 'stratified',
  schema,
  labelColumns: (s) => [{ column: s.by, path: 'scheme.by' }],
  prepare(ctx, s) {
    const labels = ctx.labels(s.by);
    const groups = ctx.statistic.groups;
    const keys = groups ? labels.map((l, i) => `${groups[i]}\u001f${l}`) : labels;
    const strata = strataFromKeys(keys);
    const description = `stratified bootstrap, rows resampled with replacement within each of the ${strata.length} strata of ${s.by}${groups ? ' and each group' : ''}`;
    return countingScheme(ctx.statistic, strata, description, false);
  },
});
