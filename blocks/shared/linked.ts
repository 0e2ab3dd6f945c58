import { estimateRunSettings } from '../estimate';
import type { EstimateAttrs } from '../estimate/schema';
import { estimateAttrs } from '../estimate/schema';
import type { FindBlock, RunSettingsResult } from './types';
import type { EstimateSettings } from '../estimate/schema';

/**
 * Blocks that draw an Estimate's resampling (histogram, convergence) hold only a link to
 * the Estimate block (`source`); their run settings are that Estimate's, so changing the
 * Estimate's settings or data recomputes them too.
 */
export function linkedEstimateSettings(source: string | null, find: FindBlock): RunSettingsResult<EstimateSettings> {
  if (!source) return { ok: false, reason: 'Choose the Estimate block to draw.' };
  const block = find(source);
  if (!block || block.type !== 'estimate') return { ok: false, reason: 'The Estimate this block drew is no longer in the memo: choose another.' };
  const attrs = estimateAttrs.safeParse(block.attrs);
  if (!attrs.success) return { ok: false, reason: 'The linked Estimate has settings that need fixing first.' };
  return estimateRunSettings(attrs.data as EstimateAttrs);
}
