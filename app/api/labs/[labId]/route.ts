import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { renameLabAs } from '@/lib/labs/labs';
import { idFrom } from '@/lib/labs/params';
import { renameLabSchema } from '@/lib/labs/schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

/** The lab's name and the caller's role in it. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  const m = await authorize(user.id, labId, 'lab:read');
  return Response.json({ lab: { id: labId, name: m.labName, role: m.role } });
});

/** Renames the lab (Owners). */
export const PATCH = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  const input = await readJson(request, renameLabSchema, 'lab');
  await authorize(user.id, labId, 'lab:rename');
  return Response.json({ lab: await renameLabAs(user.id, labId, input.name) });
});
