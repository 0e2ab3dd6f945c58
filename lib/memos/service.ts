import 'server-only';
import { findMemo, insertMemo, listMemos, saveMemoDoc, setMemoArchived, setMemoTitle } from '@/db/queries/memos';
import type { DocJson, Memo } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { checkDoc, docToYUpdate, emptyDoc } from './document';

/** The memo, if it belongs to the lab (a memo id from another lab is simply not found). */
export async function memoInLab(labId: number, memoId: number): Promise<Memo> {
  const memo = Number.isInteger(memoId) && memoId > 0 ? await findMemo(memoId) : undefined;
  if (!memo || memo.labId !== labId) throw new AppError('not_found:memo', 'No such memo in this lab.');
  return memo;
}

export async function createMemo(labId: number, userId: number, title = 'Untitled memo', doc: DocJson = emptyDoc()): Promise<number> {
  const checked = checkDoc(doc);
  return insertMemo({ labId, title, doc: checked.doc, text: checked.text, ydoc: docToYUpdate(checked.doc), createdBy: userId, updatedBy: userId });
}

/**
 * Autosave: stores the document when the client saw the latest revision. A save based on
 * an older revision is refused (conflict) rather than silently overwriting someone else's
 * work; the client then reloads. The whole document is checked first: nothing half-saved.
 */
export async function saveMemo(labId: number, memoId: number, baseRevision: number, doc: unknown, userId: number): Promise<{ revision: number }> {
  const memo = await memoInLab(labId, memoId);
  if (memo.archivedAt) throw new AppError('conflict:memo', 'This memo is archived: restore it before editing.');
  const checked = checkDoc(doc);
  const revision = await saveMemoDoc(memoId, baseRevision, checked.doc, checked.text, docToYUpdate(checked.doc), userId);
  if (revision === null) throw new AppError('conflict:memo', 'Someone else saved this memo since you opened it. Reload to see their changes.', 'revision');
  return { revision };
}

export async function renameMemo(labId: number, memoId: number, title: string, userId: number): Promise<void> {
  await memoInLab(labId, memoId);
  await setMemoTitle(memoId, title, userId);
}

export async function archiveMemo(labId: number, memoId: number, archived: boolean, userId: number): Promise<void> {
  await memoInLab(labId, memoId);
  await setMemoArchived(memoId, archived, userId);
}

/**
 * A copy of the memo with the same text and blocks. Block ids are kept: they only need to
 * be unique within a memo, and runs belong to (memo, block), so the copy's blocks find the
 * same cached results by key without recomputing.
 */
export async function duplicateMemo(labId: number, memoId: number, userId: number): Promise<number> {
  const memo = await memoInLab(labId, memoId);
  const title = `${memo.title} (copy)`.slice(0, 200);
  return createMemo(labId, userId, title, memo.doc);
}

export interface MemoSearchHit {
  id: number;
  title: string;
  updatedAt: string;
  archived: boolean;
  updatedByName: string | null;
  snippet: string;
}

/** Memos of a lab whose title or text contains `q`, with a snippet around the first match in the text. */
export async function searchMemos(labId: number, q: string | undefined, archived = false): Promise<MemoSearchHit[]> {
  const rows = await listMemos(labId, { q: q || undefined, archived });
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    updatedAt: r.updatedAt.toISOString(),
    archived: r.archivedAt !== null,
    updatedByName: r.updatedByName,
    snippet: snippet(r.text, q),
  }));
}

export function snippet(text: string, q: string | undefined, width = 140): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  if (!q) return flat.slice(0, width) + (flat.length > width ? '…' : '');
  const at = flat.toLowerCase().indexOf(q.toLowerCase());
  if (at < 0) return flat.slice(0, width) + (flat.length > width ? '…' : '');
  const start = Math.max(0, at - Math.floor((width - q.length) / 2));
  return (start > 0 ? '…' : '') + flat.slice(start, start + width) + (start + width < flat.length ? '…' : '');
}
