import { z } from 'zod';
import { listLabAudit } from '@/db/queries/audit';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { route } from '@/lib/http';
import { idFrom } from '@/lib/labs/params';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string }> };

const query = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  before: z.coerce.number().int().positive().optional(),
});

/** The lab's audit trail, newest first, paged by `before` (Owners). */
export const GET = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const labId = idFrom((await params).labId, 'lab');
  const q = parseWith(query, Object.fromEntries(new URL(request.url).searchParams), 'audit');
  await authorize(user.id, labId, 'lab:read-audit');
  const events = await listLabAudit(labId, { limit: q.limit, beforeId: q.before });
  return Response.json({ events, next: events.length === q.limit ? events[events.length - 1].id : null });
});
