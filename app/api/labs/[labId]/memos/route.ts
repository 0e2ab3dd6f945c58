import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { createMemo, searchMemos } from '@/lib/memos';
import { createMemoSchema, listMemosSchema } from '@/lib/memos/schema';
import { parseWith } from '@/lib/validation';
import { labParams } from './schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

/** The lab's memos (or archived ones with ?archived=1), searched by title and text with ?q=. */
export const GET = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { labId } = parseWith(labParams, await params, 'lab');
  const query = parseWith(listMemosSchema, Object.fromEntries(new URL(request.url).searchParams), 'search');
  await authorize(user.id, labId, 'memo:read');
  return Response.json({ memos: await searchMemos(labId, query.q, query.archived === '1') });
});

/** Creates an empty memo (Authors and Owners). */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId } = parseWith(labParams, await params, 'lab');
  const input = await readJson(request, createMemoSchema, 'memo');
  await authorize(user.id, labId, 'memo:write');
  const id = await createMemo(labId, user.id, input.title);
  return Response.json({ memo: { id, url: `/labs/${labId}/memos/${id}` } }, { status: 201 });
});
