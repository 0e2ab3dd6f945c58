'use client';

import type { Editor } from '@tiptap/core';
import { useState } from 'react';
import { CLIENT_BLOCKS } from '@/blocks/registry.client';
import { newBlockId } from '@/blocks/shared/settings';
import { docBlocks, estimatesOf } from './doc-blocks';
import type { PickerDataset } from './memo-context';

/** Inserts a new block of any registered type at the cursor, with sensible first settings. */
export function InsertMenu({ editor, datasets }: { editor: Editor; datasets: PickerDataset[] }) {
  const [open, setOpen] = useState(false);
  const insert = (k: number) => {
    const def = CLIENT_BLOCKS[k].definition;
    const attrs = def.newAttrs({ datasets, estimates: estimatesOf(docBlocks(editor)) });
    // A paragraph after the block takes the cursor, so the next insert goes below instead of replacing the selected block.
    editor.chain().focus().insertContent([{ type: def.type, attrs: { blockId: newBlockId(), ...attrs } }, { type: 'paragraph' }]).run();
    setOpen(false);
  };
  return (
    <div className="relative">
      <button type="button" aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen((o) => !o)} className="rounded bg-oxide px-3 py-1 text-sm font-medium text-white hover:bg-oxide/90">
        Insert block
      </button>
      {open && (
        <div role="menu" aria-label="Block types" className="absolute top-full left-0 z-30 mt-1 w-80 rounded-md border border-paper-edge bg-white p-1 shadow-lg">
          {CLIENT_BLOCKS.map((b, k) => (
            <button key={b.definition.type} role="menuitem" type="button" onClick={() => insert(k)} className="block w-full rounded px-3 py-2 text-left hover:bg-paper-deep">
              <span className="block text-sm font-medium text-ink">{b.definition.label}</span>
              <span className="block text-xs text-ink-faint">{b.definition.summary}</span>
            </button>
          ))}
        </div>
      )}
    </div>
  );
}
