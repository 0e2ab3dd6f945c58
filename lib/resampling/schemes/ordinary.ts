import * as z from 'zod/mini';
import { countingScheme, strataFromKeys } from './counting';
import { defineScheme } from './types';

/**
 * Ordinary (nonparametric) bootstrap: draw n rows with replacement (Efron, B. (1979),
 * "Bootstrap methods: another look at the jackknife", Annals of Statistics 7: 1–26).
 * For two-group statistics the rows are drawn within each group, keeping the group sizes
 * fixed (the two-sample bootstrap, Efron & Tibshirani 1993, §8.3).
 */
const schema = z.strictObject({ name: z.literal('ordinary') });

export const ordinary = defineScheme({
  name: 'ordinary',
  schema,
  labelColumns: () => [],
  prepare(ctx) {
    const groups = ctx.statistic.groups;
    if (groups) {
      return countingScheme(ctx.statistic, strataFromKeys(groups), 'ordinary bootstrap, rows resampled with replacement within each group', true);
    }
    const all = new Int32Array(ctx.n);
    for (let i = 0; i < ctx.n; i++) all[i] = i;
    return countingScheme(ctx.statistic, [all], 'ordinary bootstrap, rows resampled with replacement', true);
  },
});
