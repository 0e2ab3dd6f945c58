import type { AnyExtension } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';

/**
 * The memo's extension list, the same on server (schema, validation, Yjs encoding) and
 * client (editor). `nodes` are the block and Live value nodes — bare on the server, with
 * React node views on the client. With collaboration on, Yjs keeps the undo history, so
 * StarterKit's own undo/redo is turned off then (and only then).
 */
export function memoExtensions(nodes: AnyExtension[], opts: { collaboration?: boolean } = {}): AnyExtension[] {
  return [
    StarterKit.configure({
      heading: { levels: [1, 2, 3] },
      link: { openOnClick: false, autolink: true },
      ...(opts.collaboration ? { undoRedo: false as const } : {}),
    }),
    ...nodes,
  ];
}
