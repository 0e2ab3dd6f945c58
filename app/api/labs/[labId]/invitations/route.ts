import { pendingInvitations } from '@/db/queries/invitations';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { inviteToLab } from '@/lib/labs/invitations';
import { idFrom } from '@/lib/labs/params';
import { inviteSchema } from '@/lib/labs/schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

/** Pending invitations (Owners). */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  await authorize(user.id, labId, 'lab:manage-members');
  return Response.json({ invitations: await pendingInvitations(labId, new Date()) });
});

/** Invites an address with a role and mails the link (Owners with a confirmed address). */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  const input = await readJson(request, inviteSchema, 'invitation');
  await authorize(user.id, labId, 'lab:manage-members');
  const invitation = await inviteToLab(user, labId, input.email, input.role);
  return Response.json({ invitation }, { status: 201 });
});
