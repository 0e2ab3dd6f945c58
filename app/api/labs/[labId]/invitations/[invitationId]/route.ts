import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, route } from '@/lib/http';
import { revokeInvitation } from '@/lib/labs/invitations';
import { idFrom } from '@/lib/labs/params';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; invitationId: string }> };

/** Revokes a pending invitation (Owners); its link stops working at once. */
export const DELETE = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const p = await params;
  const labId = idFrom(p.labId, 'lab');
  const invitationId = idFrom(p.invitationId, 'invitation');
  await authorize(user.id, labId, 'lab:manage-members');
  await revokeInvitation(user.id, labId, invitationId);
  return new Response(null, { status: 204 });
});
