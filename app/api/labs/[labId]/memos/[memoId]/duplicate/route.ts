import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, route } from '@/lib/http';
import { duplicateMemo } from '@/lib/memos';
import { parseWith } from '@/lib/validation';
import { memoParams } from '../../schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; memoId: string }> };

/** Copies the memo (text and blocks) into a new memo of the same lab. */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  await authorize(user.id, labId, 'memo:write');
  const id = await duplicateMemo(labId, memoId, user.id);
  return Response.json({ memo: { id, url: `/labs/${labId}/memos/${id}` } }, { status: 201 });
});
