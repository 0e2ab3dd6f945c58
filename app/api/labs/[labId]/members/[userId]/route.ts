import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { changeMemberRole, removeMember } from '@/lib/labs/members';
import { idFrom } from '@/lib/labs/params';
import { changeRoleSchema } from '@/lib/labs/schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; userId: string }> };

/** Changes a member's role (Owners; the last Owner cannot be demoted). */
export const PATCH = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const p = await params;
  const labId = idFrom(p.labId, 'lab');
  const memberId = idFrom(p.userId, 'member');
  const input = await readJson(request, changeRoleSchema, 'member');
  await authorize(user.id, labId, 'lab:manage-members');
  return Response.json({ member: await changeMemberRole(user.id, labId, memberId, input.role) });
});

/** Removes a member (Owners; the last Owner cannot be removed). */
export const DELETE = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const p = await params;
  const labId = idFrom(p.labId, 'lab');
  const memberId = idFrom(p.userId, 'member');
  await authorize(user.id, labId, 'lab:manage-members');
  await removeMember(user.id, labId, memberId);
  return new Response(null, { status: 204 });
});
