import { z } from 'zod';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { AppError } from '@/lib/errors';
import { assertSameOrigin, route } from '@/lib/http';
import { cancelRun, runLab } from '@/lib/runs';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ runId: string }> };
const runParams = z.object({ runId: z.coerce.number().int().positive() });

/** Cancels a queued or running run (roles that may compute). */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { runId } = parseWith(runParams, await params, 'run');
  const where = await runLab(runId);
  if (!where) throw new AppError('not_found:run', 'No such run.');
  await authorize(user.id, where.labId, 'run:compute');
  const run = await cancelRun(runId);
  return Response.json({ run: { ...run, labId: undefined, memoId: undefined } });
});
