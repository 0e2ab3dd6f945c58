import { Node, mergeAttributes } from '@tiptap/core';

/**
 * Builds the TipTap node of a block type. Every setting is its own node attribute holding
 * plain JSON (numbers, strings, small objects), so a later Yjs document merges two people's
 * changes to different settings instead of one overwriting the other. HTML round trip:
 * each attribute becomes a `data-<name>` attribute holding its JSON.
 */
export function defineBlockNode(type: string, defaults: Record<string, unknown>) {
  return Node.create({
    name: type,
    group: 'block',
    atom: true,
    draggable: true,
    selectable: true,
    isolating: true,

    addAttributes() {
      const attrs: Record<string, { default: unknown; parseHTML: (el: HTMLElement) => unknown; renderHTML: (a: Record<string, unknown>) => Record<string, string> }> = {};
      for (const [name, value] of Object.entries({ blockId: null, ...defaults })) {
        attrs[name] = {
          default: value,
          parseHTML: (el) => {
            const raw = el.getAttribute(`data-${name}`);
            if (raw == null) return value;
            try {
              return JSON.parse(raw);
            } catch {
              return value;
            }
          },
          renderHTML: (a) => ({ [`data-${name}`]: JSON.stringify(a[name] ?? null) }),
        };
      }
      return attrs;
    },

    parseHTML() {
      return [{ tag: `div[data-margin-block="${type}"]` }];
    },

    renderHTML({ HTMLAttributes }) {
      return ['div', mergeAttributes(HTMLAttributes, { 'data-margin-block': type })];
    },
  });
}

/** The attributes of a block node as the editor holds them. */
export type BlockAttrs<S> = S & { blockId: string | null };
