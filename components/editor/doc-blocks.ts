'use client';

import type { Editor } from '@tiptap/core';
import { useEditorState } from '@tiptap/react';
import { useMemo } from 'react';
import type { DocBlock, FindBlock } from '@/blocks/shared/types';
import { STATISTIC_LABEL, statisticColumns, type Statistic } from '@/blocks/shared/settings';

/** Every block of the editor's document, in order. */
export function docBlocks(editor: Editor): (DocBlock & { blockId: string })[] {
  const out: (DocBlock & { blockId: string })[] = [];
  editor.state.doc.descendants((node) => {
    if (node.type.spec.group === 'block' && node.isAtom && typeof node.attrs.blockId === 'string') {
      out.push({ type: node.type.name, blockId: node.attrs.blockId, attrs: node.attrs });
      return false;
    }
    return true;
  });
  return out;
}

/** A short name for an Estimate block: "Estimate 2 · Median of nitrate_mg_l". */
export function estimateLabel(attrs: Record<string, unknown>, index: number): string {
  const s = attrs.statistic as Statistic | undefined;
  const what = s ? `${STATISTIC_LABEL[s.name] ?? s.name} of ${statisticColumns(s).join(', ') || '…'}` : '';
  const filter = attrs.filter as { column: string; value: string } | null;
  return `Estimate ${index} · ${what}${filter ? ` (${filter.column} = ${filter.value})` : ''}`;
}

export function estimatesOf(blocks: (DocBlock & { blockId: string })[]) {
  return blocks.filter((b) => b.type === 'estimate').map((b, i) => ({ blockId: b.blockId, label: estimateLabel(b.attrs, i + 1) }));
}

/**
 * The document's blocks as a lookup, re-rendering the caller only when some block's
 * attributes actually change (compared as JSON), not on every keystroke in the text.
 */
export function useDocBlocks(editor: Editor): { find: FindBlock; blocks: (DocBlock & { blockId: string })[] } {
  const json = useEditorState({ editor, selector: ({ editor: e }) => JSON.stringify(e ? docBlocks(e) : []) });
  return useMemo(() => {
    const blocks = JSON.parse(json ?? '[]') as (DocBlock & { blockId: string })[];
    const map = new Map(blocks.map((b) => [b.blockId, b]));
    return { blocks, find: (id: string) => map.get(id) };
  }, [json]);
}
