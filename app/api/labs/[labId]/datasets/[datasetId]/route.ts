import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { datasetWithVersions } from '@/lib/datasets';
import { renameLabDataset } from '@/lib/datasets/rename';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { parseWith } from '@/lib/validation';
import { datasetParams, renameBody } from '../schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ labId: string; datasetId: string }> };

/** A dataset with its version history, newest first. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { labId, datasetId } = parseWith(datasetParams, await params, 'dataset');
  await authorize(user.id, labId, 'dataset:read');
  const { dataset, versions } = await datasetWithVersions(labId, datasetId);
  return Response.json({ dataset, versions });
});

/** Renames a dataset (its versions and their hashes stay as they are). */
export const PATCH = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, datasetId } = parseWith(datasetParams, await params, 'dataset');
  const { name } = await readJson(request, renameBody, 'dataset');
  await authorize(user.id, labId, 'dataset:write');
  return Response.json({ dataset: await renameLabDataset(labId, datasetId, name) });
});
