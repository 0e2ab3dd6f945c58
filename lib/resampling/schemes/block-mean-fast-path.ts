import { type BlockSums, blockSums } from '../structured/block-sums';
import type { SchemeContext } from './types';

/**
 * For the mean (one series) and the difference of means (one series per group, group 0
 * first), block resamples can be summed block by block from prefix sums (structured/
 * block-sums.ts) — O(n/ℓ) per replicate instead of O(n), with the same random draws as
 * the count-based path. Null for every other statistic, which goes through counts.
 */
export function meanFastPath(ctx: SchemeContext, strata: Int32Array[]): BlockSums[] | null {
  const x = ctx.data.values.x;
  if (!x) return null;
  if (ctx.statisticName === 'mean' && strata.length === 1) return [blockSums(x, strata[0])];
  if (ctx.statisticName === 'mean-difference' && strata.length === 2) return strata.map((units) => blockSums(x, units));
  return null;
}
