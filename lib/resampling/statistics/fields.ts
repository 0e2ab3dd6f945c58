import * as z from 'zod/mini';

/** A column name in the request's data. */
export const columnName = z.string({ error: 'give a column name' }).check(z.minLength(1, 'give a column name'));

/** The two levels of a grouping column, [a, b] → statistic(a) − statistic(b). */
export const twoLevels = z
  .pipe(
    z.tuple([z.union([z.string(), z.number()]), z.union([z.string(), z.number()])], { error: 'give the two group levels as [a, b]' }),
    z.transform(([a, b]) => [String(a), String(b)] as [string, string]),
  )
  .check(z.refine(([a, b]) => a !== b, 'the two levels must differ'));
