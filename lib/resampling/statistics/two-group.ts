import * as z from 'zod/mini';
import { columnName, twoLevels } from './fields';
import type { GroupNeed } from './types';

/** Settings shared by two-group statistics: value column, grouping column, [a, b]. */
export function twoGroupSchema<N extends string>(name: N) {
  return z.strictObject({ name: z.literal(name), column: columnName, group: columnName, levels: twoLevels });
}

export function twoGroupNeed(s: { group: string; levels: [string, string] }): GroupNeed {
  return { column: s.group, path: 'statistic.group', levels: s.levels, levelsPath: 'statistic.levels' };
}

/** Units of each group, in unit order. */
export function splitGroups(group: Int32Array): [Int32Array, Int32Array] {
  const a: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < group.length; i++) (group[i] === 0 ? a : b).push(i);
  return [Int32Array.from(a), Int32Array.from(b)];
}
