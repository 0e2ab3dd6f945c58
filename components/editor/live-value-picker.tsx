'use client';

import type { Editor } from '@tiptap/core';
import { useState } from 'react';
import { CLIENT_BLOCKS } from '@/blocks/registry.client';
import { docBlocks, estimateLabel } from './doc-blocks';

/** Puts a Live value at the cursor: choose a block, then which of its outputs to show. */
export function LiveValuePicker({ editor }: { editor: Editor }) {
  const [open, setOpen] = useState(false);
  const blocks = open ? docBlocks(editor) : [];
  const counts = new Map<string, number>();
  const entries = blocks.flatMap((b) => {
    const def = CLIENT_BLOCKS.find((c) => c.definition.type === b.type)?.definition;
    if (!def?.outputs) return [];
    const n = (counts.get(b.type) ?? 0) + 1;
    counts.set(b.type, n);
    return [{ blockId: b.blockId, label: b.type === 'estimate' ? estimateLabel(b.attrs, n) : `${def.label} ${n}`, outputs: def.outputs(b.attrs) }];
  });
  return (
    <div className="relative">
      <button type="button" aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen((o) => !o)} className="rounded border border-river/40 px-3 py-1 text-sm text-river hover:bg-river-wash">
        Live value
      </button>
      {open && (
        <div role="menu" aria-label="Live value outputs" className="absolute top-full left-0 z-30 mt-1 max-h-96 w-96 overflow-auto rounded-md border border-paper-edge bg-white p-2 shadow-lg">
          {entries.length === 0 && <p className="p-2 text-sm text-ink-faint">Insert an Estimate or Group comparison first; its numbers can then be placed in the text.</p>}
          {entries.map((e) => (
            <div key={e.blockId} className="mb-2">
              <p className="px-2 text-xs font-semibold text-ink-soft">{e.label}</p>
              {e.outputs.map((o) => (
                <button
                  key={o.key}
                  role="menuitem"
                  type="button"
                  className="block w-full rounded px-2 py-1 text-left text-sm hover:bg-river-wash"
                  onClick={() => {
                    editor.chain().focus().insertLiveValue({ block: e.blockId, output: o.key }).run();
                    setOpen(false);
                  }}
                >
                  {o.label}
                </button>
              ))}
            </div>
          ))}
        </div>
      )}
    </div>
  );
}
