import 'server-only';
import { serverBlock } from '@/blocks/registry.server';
import type { DocBlock } from '@/blocks/shared/types';
import { renderSvg } from '@/components/charts/svg.server';
import { findResult } from '@/db/queries/runs';
import type { DocJson } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { canonicalJson } from '@/lib/runs/canonical-json';
import { planKey, requestRun } from '@/lib/runs/service';
import type { RunView, UnreadyView } from '@/lib/runs/types';
import { blocksOf } from './document';

export type InitialResults = Record<string, { settingsJson: string; view: RunView | UnreadyView }>;

/**
 * The results of every computing block of a stored memo, for the page to render with:
 * cached results come back at once; missing ones start computing (for roles that may) and
 * the page's blocks follow their progress. Blocks are asked in parallel.
 */
export async function memoResults(opts: { labId: number; memoId: number; doc: DocJson; userId: number; canCompute: boolean }): Promise<InitialResults> {
  const blocks = blocksOf(opts.doc);
  const byId = new Map(blocks.map((b) => [b.blockId, b as DocBlock]));
  const out: InitialResults = {};
  await Promise.all(
    blocks.map(async (b) => {
      const def = serverBlock(b.type);
      if (!def?.compute || !def.definition.runSettings) return;
      const { blockId: _id, ...attrs } = b.attrs;
      const parsed = def.definition.attrs.safeParse(attrs);
      const rs = parsed.success ? def.definition.runSettings(parsed.data, (id: string) => byId.get(id)) : { ok: false as const, reason: 'These settings need fixing.' };
      if (!rs.ok) {
        out[b.blockId] = { settingsJson: '', view: { blockId: b.blockId, state: 'unready', reason: rs.reason } };
        return;
      }
      const settingsJson = canonicalJson(rs.settings);
      try {
        const view = await requestRun({ labId: opts.labId, memoId: opts.memoId, blockId: b.blockId, type: b.type, settings: rs.settings, userId: opts.userId, canCompute: opts.canCompute, waitMs: 0 });
        out[b.blockId] = { settingsJson, view: { ...view, labId: undefined, memoId: undefined } as RunView };
      } catch (e) {
        // A block the page cannot compute (bad settings, a reader with nothing cached) asks again from the browser and shows why.
        if (!(e instanceof AppError)) throw e;
      }
    }),
  );
  return out;
}

/** A block's figure as SVG, from the stored memo's settings and the stored result for them. */
export async function blockSvg(labId: number, doc: DocJson, blockId: string): Promise<string> {
  const blocks = blocksOf(doc);
  const block = blocks.find((b) => b.blockId === blockId);
  const def = block ? serverBlock(block.type) : undefined;
  if (!block || !def) throw new AppError('not_found:block', 'No such block in this memo (changes not yet saved are not exported).');
  if (!def.compute || !def.definition.chart || !def.definition.runSettings) throw new AppError('invalid:block', `A ${def.definition.label} block has no figure to export.`);
  const { blockId: _id, ...attrs } = block.attrs;
  const parsed = def.definition.attrs.safeParse(attrs);
  if (!parsed.success) throw new AppError('invalid:block', 'The block settings need fixing before it can be exported.');
  const rs = def.definition.runSettings(parsed.data, (id: string) => blocks.find((b) => b.blockId === id));
  if (!rs.ok) throw new AppError('invalid:block', rs.reason);
  const { key } = await planKey(labId, block.type, rs.settings);
  const stored = await findResult(labId, key);
  if (!stored) throw new AppError('conflict:block', 'This block has no current result yet; open the memo to compute it, then export.');
  return renderSvg(def.definition.chart(stored.result, parsed.data));
}
