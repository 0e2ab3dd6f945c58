import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { archiveMemo, memoInLab, renameMemo, saveMemo } from '@/lib/memos';
import { patchMemoSchema, saveMemoSchema } from '@/lib/memos/schema';
import { parseWith } from '@/lib/validation';
import { memoParams } from '../schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; memoId: string }> };

/** The memo's title, document and revision. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  await authorize(user.id, labId, 'memo:read');
  const m = await memoInLab(labId, memoId);
  return Response.json({ memo: { id: m.id, title: m.title, doc: m.doc, revision: m.revision, archived: m.archivedAt !== null, updatedAt: m.updatedAt.toISOString() } });
});

/** Autosave: the whole document, based on the revision the client last saw. */
export const PUT = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  const input = await readJson(request, saveMemoSchema, 'memo');
  await authorize(user.id, labId, 'memo:write');
  return Response.json(await saveMemo(labId, memoId, input.revision, input.doc, user.id));
});

/** Renames, archives or restores the memo. */
export const PATCH = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  const input = await readJson(request, patchMemoSchema, 'memo');
  await authorize(user.id, labId, 'memo:write');
  if (input.title !== undefined) await renameMemo(labId, memoId, input.title, user.id);
  if (input.archived !== undefined) await archiveMemo(labId, memoId, input.archived, user.id);
  return Response.json({ ok: true });
});
