import { z } from 'zod';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { AppError } from '@/lib/errors';
import { route } from '@/lib/http';
import { getRunView, runLab } from '@/lib/runs';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ runId: string }> };
const runParams = z.object({ runId: z.coerce.number().int().positive() });

/** A run's state and progress (polled while it computes), and its result once current. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { runId } = parseWith(runParams, await params, 'run');
  const where = await runLab(runId);
  if (!where) throw new AppError('not_found:run', 'No such run.');
  await authorize(user.id, where.labId, 'memo:read');
  const run = await getRunView(runId);
  return Response.json({ run: { ...run, labId: undefined, memoId: undefined } }, { headers: { 'cache-control': 'no-store' } });
});
