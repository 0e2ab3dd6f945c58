'use client';

import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { useDocBlocks } from '@/components/editor/doc-blocks';
import { useMemoContext } from '@/components/editor/memo-context';
import { useBlockResult } from '@/components/editor/results-store';
import { CLIENT_BLOCKS } from '../registry.client';
import { formatLive } from './format';
import type { LiveValueAttrs } from './schema';

/**
 * A Live value in a sentence: the chosen output of its block's shown result, formatted to
 * the digits its SE supports. While the block recomputes (or its settings are unfinished)
 * the old number stays, marked stale, so a reader never mistakes it for current.
 */
export function LiveValueView(props: NodeViewProps) {
  const attrs = props.node.attrs as LiveValueAttrs;
  const ctx = useMemoContext();
  const result = useBlockResult(ctx.store, attrs.block);
  const { find } = useDocBlocks(props.editor);
  const block = attrs.block ? find(attrs.block) : undefined;
  // CLIENT_BLOCKS is read at render time, so the registry ⇄ view import cycle is harmless.
  const def = block ? CLIENT_BLOCKS.find((b) => b.definition.type === block.type)?.definition : undefined;
  const picked = result?.shown && def?.pick ? def.pick(result.shown.result, attrs.output) : null;
  const outputs = block && def?.outputs ? def.outputs(block.attrs) : [];
  const label = outputs.find((o) => o.key === attrs.output)?.label ?? attrs.output;
  const stale = !result || result.stale;
  const text = picked ? formatLive(picked) : block ? '…' : 'no block';
  const editable = props.editor.isEditable && ctx.canWrite;
  return (
    <NodeViewWrapper
      as="span"
      data-live-value=""
      data-block={attrs.block ?? ''}
      data-output={attrs.output}
      data-stale={stale ? 'true' : 'false'}
      data-run={result?.shown?.id ?? ''}
      title={`${label}${stale ? ' — stale: its block is recomputing or needs settings' : ' — live from its block'}`}
      className={`relative mx-0.5 inline-flex items-baseline rounded px-1 font-mono text-[0.92em] tabular ${stale ? 'bg-amber-wash text-amber underline decoration-dotted underline-offset-4' : 'bg-river-wash text-river'} ${props.selected ? 'ring-2 ring-river/40' : ''}`}
    >
      <span aria-label={`${label}: ${text}${stale ? ' (stale)' : ''}`}>{text}</span>
      {props.selected && editable && outputs.length > 0 && (
        <select
          aria-label="Live value shows"
          className="absolute top-full left-0 z-20 mt-1 rounded border border-paper-edge bg-white font-sans text-xs text-ink shadow"
          value={attrs.output}
          onChange={(e) => props.updateAttributes({ output: e.target.value })}
        >
          {outputs.map((o) => (
            <option key={o.key} value={o.key}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </NodeViewWrapper>
  );
}
