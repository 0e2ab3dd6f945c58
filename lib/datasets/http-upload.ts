import 'server-only';
import { AppError } from '@/lib/errors';
import { MAX_UPLOAD_BYTES } from './limits';

/** The request body as a stream of byte chunks, read as it arrives (never buffered whole). */
export async function* requestBytes(request: Request): AsyncGenerator<Uint8Array> {
  if (!request.body) return;
  const reader = request.body.getReader();
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return;
      if (value && value.length) yield value;
    }
  } finally {
    reader.releaseLock();
  }
}

/** The Content-Length the client announced, if any. */
export function declaredLength(request: Request): number | undefined {
  const v = request.headers.get('content-length');
  if (v === null || !/^\d+$/.test(v)) return undefined;
  return Number(v);
}

/**
 * Reads and discards what is left of a refused upload (up to the upload limit), so the browser
 * finishes sending and then sees our answer rather than a reset connection.
 */
export async function drain(request: Request): Promise<void> {
  if (!request.body || request.bodyUsed) return;
  let n = 0;
  try {
    const reader = request.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      n += value?.length ?? 0;
      if (n > MAX_UPLOAD_BYTES) {
        await reader.cancel();
        break;
      }
    }
  } catch {
    /* the client went away: nothing to answer */
  }
}

export function wantsProgress(request: Request): boolean {
  return (request.headers.get('accept') ?? '').includes('application/x-ndjson');
}

function errorBody(e: unknown): { status: number; body: { error: { code: string; message: string; path: string } } } {
  if (e instanceof AppError) return { status: e.status, body: e.toJSON() };
  console.error('[margin] dataset upload failed', e);
  return { status: 500, body: { error: { code: 'internal:server', message: 'Something went wrong on the server while storing the dataset. Nothing was stored; please try again.', path: '' } } };
}

/**
 * Answers an upload. Plain requests get one JSON answer with its status (201, or the error's).
 * A client that sends `Accept: application/x-ndjson` gets a stream of lines instead —
 * `{"type":"progress",...}` while the file is read and stored, then one
 * `{"type":"done","status":201,...}` or `{"type":"error","status":422,"error":{...}}` — so it
 * can show a progress bar for the parsing and storing that follow the upload itself.
 */
export async function uploadResponse<P, T extends object>(request: Request, run: (onProgress: ((p: P) => void) | undefined, signal: AbortSignal) => Promise<T>): Promise<Response> {
  // Aborted when the uploader goes away (Cancel aborts the request; Next aborts request.signal
  // when the connection closes) or stops reading the progress stream: the import then stops,
  // rolls back its transaction if it had begun one, and stores nothing.
  const abort = new AbortController();
  const gone = () => abort.abort(new AppError('bad_request:dataset', 'The upload was cancelled. Nothing was stored.', 'file'));
  if (request.signal?.aborted) gone();
  else request.signal?.addEventListener('abort', gone, { once: true });
  if (!wantsProgress(request)) {
    try {
      return Response.json(await run(undefined, abort.signal), { status: 201 });
    } catch (e) {
      await drain(request);
      throw e;
    }
  }
  const encoder = new TextEncoder();
  let open = true;
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const send = (line: object) => {
        if (open) controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
      };
      try {
        const result = await run((p) => send({ type: 'progress', ...p }), abort.signal);
        send({ type: 'done', status: 201, ...result });
      } catch (e) {
        await drain(request);
        const { status, body } = errorBody(e);
        send({ type: 'error', status, ...body });
      }
      if (open) controller.close();
    },
    cancel() {
      open = false;
      gone();
    },
  });
  return new Response(stream, { status: 200, headers: { 'content-type': 'application/x-ndjson; charset=utf-8', 'cache-control': 'no-store', 'x-accel-buffering': 'no' } });
}
