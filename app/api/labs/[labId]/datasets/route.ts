import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { listDatasets } from '@/lib/datasets';
import { declaredLength, requestBytes, uploadResponse } from '@/lib/datasets/http-upload';
import { uploadDataset } from '@/lib/datasets/upload';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { parseWith } from '@/lib/validation';
import { labParams, pasteBody, readOptionsOf, uploadQuery } from './schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ labId: string }> };

/** The lab's datasets, each with its newest version. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { labId } = parseWith(labParams, await params, 'lab');
  await authorize(user.id, labId, 'dataset:read');
  return Response.json({ datasets: await listDatasets(labId) });
});

/**
 * Creates a dataset with its version 1. Either the body is the CSV file itself (any type
 * but JSON; streamed, options and `name` in the query), or JSON `{ name, csv, delimiter?,
 * header?, decimal? }` for a pasted table. With `Accept: application/x-ndjson` the answer
 * streams progress (see lib/datasets/http-upload.ts).
 */
export const POST = route<Ctx>(async (request, { params }) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const { labId } = parseWith(labParams, await params, 'lab');
  if ((request.headers.get('content-type') ?? '').includes('application/json')) {
    const input = await readJson(request, pasteBody, 'dataset');
    await authorize(user.id, labId, 'dataset:write');
    return uploadResponse(request, (onProgress, signal) =>
      uploadDataset({ labId, userId: user.id, name: input.name, options: readOptionsOf(input), source: { kind: 'paste' }, body: input.csv, signal }, onProgress),
    );
  }
  const q = parseWith(uploadQuery, Object.fromEntries(new URL(request.url).searchParams), 'dataset');
  await authorize(user.id, labId, 'dataset:write');
  return uploadResponse(request, (onProgress, signal) =>
    uploadDataset(
      { labId, userId: user.id, name: q.name, options: readOptionsOf(q), source: { kind: q.source, fileName: q.fileName }, body: requestBytes(request), declaredBytes: declaredLength(request), signal },
      onProgress,
    ),
  );
});
