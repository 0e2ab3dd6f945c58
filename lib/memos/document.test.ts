// The memo's stored form: schema check, block re-validation, search text, and the Yjs update
// a collaboration server will load (decoded back with y-tiptap, the binding TipTap uses).
import { yDocToProsemirrorJSON } from '@tiptap/y-tiptap';
import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { ESTIMATE_DEFAULTS } from '@/blocks/estimate';
import { checkDoc, docToYUpdate, memoSchema, YJS_FIELD } from './document';

const estimate = (blockId: string, patch: Record<string, unknown> = {}) => ({ type: 'estimate', attrs: { ...ESTIMATE_DEFAULTS, dataset: { datasetId: 4, versionId: null }, statistic: { name: 'median', column: 'nitrate_mg_l' }, blockId, ...patch } });
const doc = (...content: unknown[]) => ({ type: 'doc', content });
const para = (...content: unknown[]) => ({ type: 'paragraph', content });

describe('memo document', () => {
  it('accepts text, blocks and Live values, and extracts the searchable text', () => {
    const d = doc({ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Nitrate below the works' }] }, para({ type: 'text', text: 'The median is ' }, { type: 'liveValue', attrs: { block: 'b1', output: 'estimate' } }, { type: 'text', text: ' mg/L.' }), estimate('b1'));
    const c = checkDoc(d);
    expect(c.text).toContain('Nitrate below the works');
    expect(c.text).toContain('The median is  mg/L.');
    expect(c.blocks.map((b) => [b.type, b.blockId])).toEqual([['estimate', 'b1']]);
  });

  it('refuses unknown nodes, with a message', () => {
    expect(() => checkDoc(doc({ type: 'script', content: [] }))).toThrow(expect.objectContaining({ code: 'invalid:memo' }));
    expect(() => checkDoc({ type: 'paragraph' })).toThrow(expect.objectContaining({ code: 'invalid:memo' }));
  });

  it('re-validates block settings with the block schema, naming block and field', () => {
    expect(() => checkDoc(doc(estimate('b1', { B: 'lots' })))).toThrow(expect.objectContaining({ path: 'blocks.0.B', message: expect.stringMatching(/^Estimate block 1: B:/) }));
    expect(() => checkDoc(doc(estimate('b1', { statistic: { name: 'mode', column: 'x' } })))).toThrow(expect.objectContaining({ path: expect.stringMatching(/^blocks\.0\.statistic/) }));
    expect(() => checkDoc(doc(estimate('b1'), estimate('b1')))).toThrow(/repeats the block id/);
    expect(() => checkDoc(doc(estimate('')))).toThrow(/has no block id/);
  });

  it('stores a Yjs update that decodes to the same document', () => {
    const d = checkDoc(doc(para({ type: 'text', text: 'Upstream vs downstream' }), estimate('b9', { B: 5000, seed: 'kelp' }))).doc;
    const update = docToYUpdate(d);
    const ydoc = new Y.Doc();
    Y.applyUpdate(ydoc, new Uint8Array(update));
    // Yjs leaves out null attributes; the schema restores them as their (null) defaults.
    expect(memoSchema().nodeFromJSON(yDocToProsemirrorJSON(ydoc, YJS_FIELD)).toJSON()).toEqual(d);
  });

  it('renders block settings as data attributes holding JSON (HTML copy and paste)', () => {
    const node = memoSchema().nodeFromJSON(estimate('b2', { B: 3000 }));
    const spec = node.type.spec.toDOM!(node) as [string, Record<string, string>];
    expect(spec[0]).toBe('div');
    expect(spec[1]['data-margin-block']).toBe('estimate');
    expect(JSON.parse(spec[1]['data-B'])).toBe(3000);
    expect(JSON.parse(spec[1]['data-statistic'])).toEqual({ name: 'median', column: 'nitrate_mg_l' });
    const rule = node.type.spec.parseDOM![0];
    expect(rule.tag).toBe('div[data-margin-block="estimate"]');
  });
});
