import type { SchemeContext } from './types';

/**
 * The series a block scheme resamples: the units in row order, or for a two-group
 * statistic each group's units in row order (each group is then its own series, and
 * blocks never cross from one group to the other).
 */
export function seriesStrata(ctx: SchemeContext): Int32Array[] {
  const groups = ctx.statistic.groups;
  if (!groups) return [Int32Array.from({ length: ctx.n }, (_, i) => i)];
  const a: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < groups.length; i++) (groups[i] === 0 ? a : b).push(i);
  return [Int32Array.from(a), Int32Array.from(b)];
}
