// Memos on the real MariaDB test instance: create, autosave with revisions, rename,
// duplicate, archive and search by title and text; nothing half-saved on bad input.
import * as Y from 'yjs';
import { yDocToProsemirrorJSON } from '@tiptap/y-tiptap';
import { beforeAll, describe, expect, it } from 'vitest';
import { useTestDatabase } from '../support/database';

useTestDatabase();

let labId: number;
let otherLab: number;
let userId: number;
type M = typeof import('@/lib/memos');
let m: M;
const text = (s: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: s }] }] });

beforeAll(async () => {
  m = await import('@/lib/memos');
  const { insertUser } = await import('@/db/queries/users');
  const { createLab } = await import('@/db/queries/labs');
  userId = await insertUser({ email: 'memo@example.org', name: 'Memo Writer', passwordHash: 'x' });
  labId = await createLab('Memo lab', userId);
  otherLab = await createLab('Elsewhere', userId);
});

describe('memos', () => {
  it('creates, autosaves with increasing revisions, and refuses a save built on an old revision', async () => {
    const id = await m.createMemo(labId, userId, 'Nitrate at the outfall');
    expect((await m.memoInLab(labId, id)).revision).toBe(1);
    expect(await m.saveMemo(labId, id, 1, text('Downstream readings rose after the storm.'), userId)).toEqual({ revision: 2 });
    await expect(m.saveMemo(labId, id, 1, text('stale edit'), userId)).rejects.toMatchObject({ code: 'conflict:memo' });
    const stored = await m.memoInLab(labId, id);
    expect(stored.text).toBe('Downstream readings rose after the storm.');
    // The stored Yjs update holds the same document.
    const ydoc = new Y.Doc();
    Y.applyUpdate(ydoc, new Uint8Array(stored.ydoc!));
    expect(yDocToProsemirrorJSON(ydoc, 'default')).toEqual(stored.doc);
  });

  it('stores nothing when the document is invalid', async () => {
    const id = await m.createMemo(labId, userId, 'Guarded');
    await expect(m.saveMemo(labId, id, 1, { type: 'doc', content: [{ type: 'estimate', attrs: { blockId: 'x', B: -3 } }] }, userId)).rejects.toMatchObject({ code: 'invalid:memo' });
    const after = await m.memoInLab(labId, id);
    expect(after.revision).toBe(1);
  });

  it('does not find a memo through another lab', async () => {
    const id = await m.createMemo(labId, userId, 'Private');
    await expect(m.memoInLab(otherLab, id)).rejects.toMatchObject({ code: 'not_found:memo' });
    await expect(m.saveMemo(otherLab, id, 1, text('x'), userId)).rejects.toMatchObject({ code: 'not_found:memo' });
  });

  it('renames, duplicates and archives; search matches title and text, not archived memos', async () => {
    const id = await m.createMemo(labId, userId, 'Weir survey');
    await m.saveMemo(labId, id, 1, text('Phosphate was below 0.1 mg/L at 100% of visits.'), userId);
    await m.renameMemo(labId, id, 'Weir survey, spring', userId);
    const copy = await m.duplicateMemo(labId, id, userId);
    expect((await m.memoInLab(labId, copy)).title).toBe('Weir survey, spring (copy)');
    expect((await m.memoInLab(labId, copy)).doc).toEqual((await m.memoInLab(labId, id)).doc);

    const byTitle = await m.searchMemos(labId, 'weir');
    expect(byTitle.map((h) => h.id).sort()).toEqual([id, copy].sort());
    const byText = await m.searchMemos(labId, 'PHOSPHATE');
    expect(byText.map((h) => h.id).sort()).toEqual([id, copy].sort());
    expect(byText[0].snippet).toMatch(/Phosphate was below/);
    // LIKE wildcards in the query are taken literally.
    expect((await m.searchMemos(labId, '100%')).length).toBe(2);
    expect((await m.searchMemos(labId, '1_0')).length).toBe(0);

    await m.archiveMemo(labId, copy, true, userId);
    expect((await m.searchMemos(labId, 'weir')).map((h) => h.id)).toEqual([id]);
    expect((await m.searchMemos(labId, 'weir', true)).map((h) => h.id)).toEqual([copy]);
    await expect(m.saveMemo(labId, copy, 1, text('edit while archived'), userId)).rejects.toMatchObject({ code: 'conflict:memo' });
  });
});

describe('demo memo', () => {
  it('is seeded after the demo datasets, with every block type, and passes the document checks', async () => {
    const { seedDemo } = await import('@/lib/demo/seed');
    const r = await seedDemo();
    const hits = await m.searchMemos(r.labId!, 'treatment works');
    expect(hits.map((h) => h.title)).toEqual(['Nitrate below the treatment works']);
    const memo = await m.memoInLab(r.labId!, hits[0].id);
    const checked = m.checkDoc(memo.doc);
    expect(new Set(checked.blocks.map((b) => b.type))).toEqual(new Set(['data-table', 'estimate', 'resample-histogram', 'convergence-plot', 'group-comparison']));
    expect(JSON.stringify(memo.doc)).toContain('"liveValue"');
  });
});
