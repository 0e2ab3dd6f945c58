import { cellEditRequest } from '@/blocks/data-table/schema';
import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { memoInLab } from '@/lib/memos';
import { editCells, tablePage } from '@/lib/memos/table';
import { parseWith } from '@/lib/validation';
import { memoParams, tableQuery } from '../../schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; memoId: string }> };

/** The rows a Data table block of this memo shows (?datasetId=, optional &versionId=). */
export const GET = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  const q = parseWith(tableQuery, Object.fromEntries(new URL(request.url).searchParams), 'table');
  await authorize(user.id, labId, 'dataset:read');
  await memoInLab(labId, memoId);
  return Response.json(await tablePage(labId, { datasetId: q.datasetId, versionId: q.versionId ?? null }));
});

/** Cell edits from a Data table block, saved as a new dataset version. */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, memoId } = parseWith(memoParams, await params, 'memo');
  const input = await readJson(request, cellEditRequest, 'cell');
  await authorize(user.id, labId, 'dataset:write');
  await memoInLab(labId, memoId);
  return Response.json(await editCells(labId, input, user.id), { status: 201 });
});
