import { labsForUser } from '@/db/queries/labs';
import { requireUser } from '@/lib/auth/session';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { createLabFor } from '@/lib/labs/labs';
import { createLabSchema } from '@/lib/labs/schema';

export const dynamic = 'force-dynamic';

/** The labs the signed-in user belongs to, with their role in each. */
export const GET = route(async () => {
  const user = await requireUser();
  return Response.json({ labs: await labsForUser(user.id) });
});

/** Creates a lab; its creator becomes its Owner. Any signed-in account may. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const input = await readJson(request, createLabSchema, 'lab');
  const lab = await createLabFor(user.id, input.name);
  return Response.json({ lab: { ...lab, role: 'owner' } }, { status: 201 });
});
