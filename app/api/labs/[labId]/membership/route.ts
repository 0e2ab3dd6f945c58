import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, route } from '@/lib/http';
import { leaveLab } from '@/lib/labs/members';
import { idFrom } from '@/lib/labs/params';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

/** The caller leaves the lab (any member, except its last Owner). */
export const DELETE = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  // Leaving needs only membership; authorize still refuses non-members with not_found.
  await authorize(user.id, labId, 'lab:read');
  await leaveLab(user.id, labId);
  return new Response(null, { status: 204 });
});
