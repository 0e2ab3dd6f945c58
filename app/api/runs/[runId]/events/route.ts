import { z } from 'zod';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { AppError } from '@/lib/errors';
import { route } from '@/lib/http';
import { runLab } from '@/lib/runs';
import { runEventStream } from '@/lib/runs/events';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ runId: string }> };
const runParams = z.object({ runId: z.coerce.number().int().positive() });

/** A computing run's progress as server-sent events, ending with the run itself (see lib/runs/events.ts). */
export const GET = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { runId } = parseWith(runParams, await params, 'run');
  const where = await runLab(runId);
  if (!where) throw new AppError('not_found:run', 'No such run.');
  await authorize(user.id, where.labId, 'memo:read');
  return new Response(runEventStream(runId, request.signal), {
    headers: { 'content-type': 'text/event-stream; charset=utf-8', 'cache-control': 'no-store', 'x-accel-buffering': 'no' },
  });
});
