import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { versionOfDataset } from '@/lib/datasets';
import { route } from '@/lib/http';
import { parseWith } from '@/lib/validation';
import { versionParams } from '../../../schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ labId: string; datasetId: string; version: string }> };

/** One version's metadata: hash, row count, columns with their types, missing counts and summaries. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { labId, datasetId, version } = parseWith(versionParams, await params, 'dataset');
  await authorize(user.id, labId, 'dataset:read');
  return Response.json({ version: await versionOfDataset(labId, datasetId, version) });
});
