import 'server-only';
import { and, desc, eq, isNotNull, isNull, like, or, sql } from 'drizzle-orm';
import { getDb } from '../client';
import { memos, users, type DocJson, type Memo, type NewMemo } from '../schema';

export async function insertMemo(row: NewMemo): Promise<number> {
  const [r] = await getDb().insert(memos).values(row).$returningId();
  return r.id;
}

export async function findMemo(id: number): Promise<Memo | undefined> {
  const [r] = await getDb().select().from(memos).where(eq(memos.id, id)).limit(1);
  return r;
}

/** `%` and `_` are LIKE wildcards; a search for "5%" means the text "5%". */
function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export interface MemoListItem {
  id: number;
  title: string;
  updatedAt: Date;
  archivedAt: Date | null;
  updatedByName: string | null;
  text: string;
}

/** A lab's memos, newest change first; `q` matches the title or the text (case-insensitive collation). */
export async function listMemos(labId: number, opts: { q?: string; archived?: boolean; limit?: number } = {}): Promise<MemoListItem[]> {
  const conds = [eq(memos.labId, labId), opts.archived ? isNotNull(memos.archivedAt) : isNull(memos.archivedAt)];
  if (opts.q) conds.push(or(like(memos.title, likePattern(opts.q)), like(memos.text, likePattern(opts.q)))!);
  return getDb()
    .select({
      id: memos.id,
      title: memos.title,
      updatedAt: memos.updatedAt,
      archivedAt: memos.archivedAt,
      updatedByName: users.name,
      // Only the start of the text travels: enough for a snippet around a match near the top.
      text: sql<string>`LEFT(${memos.text}, 4000)`,
    })
    .from(memos)
    .leftJoin(users, eq(users.id, memos.updatedBy))
    .where(and(...conds))
    .orderBy(desc(memos.updatedAt), desc(memos.id))
    .limit(opts.limit ?? 200);
}

/**
 * Saves a new document if the memo is still at `baseRevision` (optimistic concurrency):
 * returns the new revision, or null when someone saved in between.
 */
export async function saveMemoDoc(id: number, baseRevision: number, doc: DocJson, text: string, ydoc: Buffer, userId: number): Promise<number | null> {
  const [res] = await getDb()
    .update(memos)
    .set({ doc, text, ydoc, revision: baseRevision + 1, updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(memos.id, id), eq(memos.revision, baseRevision)));
  return (res as unknown as { affectedRows: number }).affectedRows === 1 ? baseRevision + 1 : null;
}

export async function setMemoTitle(id: number, title: string, userId: number): Promise<void> {
  await getDb().update(memos).set({ title, updatedBy: userId, updatedAt: new Date() }).where(eq(memos.id, id));
}

export async function setMemoArchived(id: number, archived: boolean, userId: number): Promise<void> {
  await getDb()
    .update(memos)
    .set({ archivedAt: archived ? new Date() : null, updatedBy: userId, updatedAt: new Date() })
    .where(eq(memos.id, id));
}
