import { requireUser } from '@/lib/auth/session';
import { authorize, can } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { memoInLab } from '@/lib/memos';
import { runRequestSchema } from '@/lib/memos/schema';
import { requestRun } from '@/lib/runs';
import { parseWith } from '@/lib/validation';
import { memoParams } from '../../schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; memoId: string }> };

/**
 * A block's result for the given settings: a cached result at once, else (for roles that
 * may compute) a new run, answered when done or after ~0.4 s with its progress; the client
 * then follows /api/runs/[runId]/events (or polls /api/runs/[runId]). Reading cached results needs memo:read only.
 */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  const input = await readJson(request, runRequestSchema, 'run');
  const m = await authorize(user.id, labId, 'memo:read');
  await memoInLab(labId, memoId);
  const run = await requestRun({ labId, memoId, blockId: input.blockId, type: input.type, settings: input.settings, userId: user.id, canCompute: can(m.role, 'run:compute') });
  return Response.json({ run: { ...run, labId: undefined, memoId: undefined } }, { status: run.state === 'current' ? 200 : 202 });
});
