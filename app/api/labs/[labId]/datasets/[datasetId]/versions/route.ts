import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { declaredLength, requestBytes, uploadResponse } from '@/lib/datasets/http-upload';
import { saveEditedTable } from '@/lib/datasets/edit';
import { uploadDataset } from '@/lib/datasets/upload';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { parseWith } from '@/lib/validation';
import { datasetParams, readOptionsOf, uploadQuery, versionBody } from '../../schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ labId: string; datasetId: string }> };

/**
 * Adds the next version to a dataset; earlier versions are never changed. The body is the
 * CSV file itself (streamed; options in the query), or JSON: `{ csv, delimiter?, header?,
 * decimal? }` for a paste, or `{ columns, rows }` for an edited table.
 */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId, datasetId } = parseWith(datasetParams, await params, 'dataset');
  if ((request.headers.get('content-type') ?? '').includes('application/json')) {
    const input = await readJson(request, versionBody, 'dataset');
    await authorize(user.id, labId, 'dataset:write');
    if ('columns' in input) return Response.json(await saveEditedTable(labId, datasetId, input.columns, input.rows, user.id), { status: 201 });
    return uploadResponse(request, (onProgress, signal) =>
      uploadDataset({ labId, userId: user.id, datasetId, options: readOptionsOf(input), source: { kind: 'paste' }, body: input.csv, signal }, onProgress),
    );
  }
  const q = parseWith(uploadQuery, Object.fromEntries(new URL(request.url).searchParams), 'dataset');
  await authorize(user.id, labId, 'dataset:write');
  return uploadResponse(request, (onProgress, signal) =>
    uploadDataset(
      { labId, userId: user.id, datasetId, options: readOptionsOf(q), source: { kind: q.source, fileName: q.fileName }, body: requestBytes(request), declaredBytes: declaredLength(request), signal },
      onProgress,
    ),
  );
});
