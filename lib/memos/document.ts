import 'server-only';
import { getSchema } from '@tiptap/core';
import type { Node as PMNode, Schema } from '@tiptap/pm/model';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import * as Y from 'yjs';
import { SERVER_BLOCKS, serverBlock } from '@/blocks/registry.server';
import { liveValueAttrs, liveValueNode } from '@/blocks/live-value';
import type { DocBlock } from '@/blocks/shared/types';
import type { DocJson } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { memoExtensions } from './extensions';

/** The Yjs XML fragment the editor's Collaboration extension uses by default. */
export const YJS_FIELD = 'default';
// A memo is text plus block settings; results live in runs. 2 MB of JSON is far beyond any
// memo a person writes, and keeps one save from filling the database.
export const MAX_DOC_BYTES = 2_000_000;

let schema: Schema | undefined;
export function memoSchema(): Schema {
  return (schema ??= getSchema(memoExtensions([...SERVER_BLOCKS.map((b) => b.definition.node), liveValueNode])));
}

export function emptyDoc(): DocJson {
  return { type: 'doc', content: [{ type: 'paragraph' }] };
}

export interface CheckedDoc {
  doc: DocJson;
  node: PMNode;
  text: string;
  blocks: (DocBlock & { blockId: string })[];
}

/**
 * Checks a document sent by a client before it is stored: it must fit the memo schema
 * (known nodes and marks, valid nesting), every block's attributes must pass its type's
 * zod schema and carry a unique block id, and every Live value must be well formed.
 * Anything in a shared document can be forged, so nothing is trusted. Throws an
 * AppError naming the block and field at fault.
 */
export function checkDoc(json: unknown): CheckedDoc {
  const size = Buffer.byteLength(JSON.stringify(json ?? null));
  if (size > MAX_DOC_BYTES) throw new AppError('too_large:memo', `The memo is too large to save (${Math.round(size / 1000)} kB; the limit is ${MAX_DOC_BYTES / 1000} kB).`, 'doc');
  let node: PMNode;
  try {
    node = memoSchema().nodeFromJSON(json);
    if (node.type.name !== 'doc') throw new Error('the top node must be "doc"');
    node.check();
  } catch (e) {
    throw new AppError('invalid:memo', `The document does not fit the memo format: ${(e as Error).message}`, 'doc');
  }
  const blocks: CheckedDoc['blocks'] = [];
  const seen = new Set<string>();
  let index = 0;
  node.descendants((child) => {
    const type = child.type.name;
    if (type === 'liveValue') {
      const r = liveValueAttrs.safeParse(child.attrs);
      if (!r.success) throw new AppError('invalid:memo', `A Live value is malformed: ${r.error.issues[0]?.message}`, 'doc');
      return false;
    }
    const sb = serverBlock(type);
    if (!sb) return true;
    index++;
    const { blockId, ...attrs } = child.attrs as Record<string, unknown>;
    const label = `${sb.definition.label} block ${index}`;
    if (typeof blockId !== 'string' || blockId.length === 0 || blockId.length > 64) throw new AppError('invalid:memo', `${label} has no block id.`, `blocks.${index - 1}.blockId`);
    if (seen.has(blockId)) throw new AppError('invalid:memo', `${label} repeats the block id of another block.`, `blocks.${index - 1}.blockId`);
    seen.add(blockId);
    const r = sb.definition.attrs.safeParse(attrs);
    if (!r.success) {
      const issue = r.error.issues[0];
      const field = issue?.path.map(String).join('.') ?? '';
      throw new AppError('invalid:memo', `${label}: ${field ? `${field}: ` : ''}${issue?.message ?? 'invalid settings'}`, `blocks.${index - 1}.${field}`);
    }
    blocks.push({ type, blockId, attrs: child.attrs as Record<string, unknown> });
    return false;
  });
  const text = node.textBetween(0, node.content.size, '\n', (leaf) => (leaf.type.name === 'hardBreak' ? '\n' : ''));
  return { doc: node.toJSON() as DocJson, node, text, blocks };
}

/** The document as one Yjs update (what a collaboration server loads with Y.applyUpdate). */
export function docToYUpdate(doc: DocJson): Buffer {
  const ydoc = prosemirrorJSONToYDoc(memoSchema(), doc, YJS_FIELD);
  const update = Y.encodeStateAsUpdate(ydoc);
  ydoc.destroy();
  return Buffer.from(update);
}

/** The blocks of a stored document (for computing results when the memo opens). */
export function blocksOf(doc: DocJson): (DocBlock & { blockId: string })[] {
  const out: (DocBlock & { blockId: string })[] = [];
  const walk = (n: DocJson) => {
    if (serverBlock(n.type) && typeof n.attrs?.blockId === 'string') out.push({ type: n.type, blockId: n.attrs.blockId as string, attrs: n.attrs });
    else n.content?.forEach(walk);
  };
  walk(doc);
  return out;
}
