import { membersOf } from '@/db/queries/labs';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { route } from '@/lib/http';
import { idFrom } from '@/lib/labs/params';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

/** The lab's members and their roles (every member may see who else is in the lab). */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  await authorize(user.id, labId, 'lab:read');
  return Response.json({ members: await membersOf(labId) });
});
