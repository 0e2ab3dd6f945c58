import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { versionRowsPage } from '@/lib/datasets/rows-page';
import { route } from '@/lib/http';
import { parseWith } from '@/lib/validation';
import { rowsQuery, versionParams } from '../../../../schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ labId: string; datasetId: string; version: string }> };

/** Rows [offset, offset + limit) of a version (limit ≤ 1000), as arrays in column order. */
export const GET = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { labId, datasetId, version } = parseWith(versionParams, await params, 'dataset');
  const { offset, limit } = parseWith(rowsQuery, Object.fromEntries(new URL(request.url).searchParams), 'rows');
  await authorize(user.id, labId, 'dataset:read');
  return Response.json(await versionRowsPage(labId, datasetId, version, offset, limit), { headers: { 'cache-control': 'private, max-age=3600' } });
});
