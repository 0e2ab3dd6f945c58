// The datasets worker thread: reads one CSV upload — UTF-8 check, record splitting, column
// typing (parse.ts), then summaries, SHA-256 and chunk encoding (prepare.ts) — off the web
// server's event loop. Bundled to plain JS by lib/datasets/build-worker.mjs
// (dist/datasets/worker.mjs), since worker threads cannot load TypeScript under `next start`.
// One worker per upload; the server ends it when the upload is done or abandoned.
import { parentPort } from 'node:worker_threads';
import { parseCsv } from './parse';
import { prepareTable } from './prepare';
import type { FromDatasetsWorker, PreparedMessage, ToDatasetsWorker } from './worker-protocol';

const port = parentPort;
if (!port) throw new Error('lib/datasets/worker-entry runs as a worker thread');

const post = (m: FromDatasetsWorker, transfer: ArrayBuffer[] = []) => port.postMessage(m, transfer);

/** Incoming chunks as an async iterable: the parser pulls, messages push. */
const queue: (Uint8Array | null)[] = [];
let wake: (() => void) | null = null;
let started = false;

async function* incoming(): AsyncGenerator<Uint8Array> {
  for (;;) {
    while (queue.length === 0) await new Promise<void>((r) => (wake = r));
    const next = queue.shift()!;
    if (next === null) return;
    yield next;
    // The parser has taken this chunk in: the server may send another.
    post({ type: 'ack' });
  }
}

/** A buffer that can be transferred whole: a view over all of its own ArrayBuffer, else a copy. */
function own(b: Uint8Array): ArrayBuffer {
  if (b.byteOffset === 0 && b.byteLength === b.buffer.byteLength && b.buffer instanceof ArrayBuffer) return b.buffer;
  // new Uint8Array(view) copies (Buffer#slice would not: it returns a view of the same memory).
  return new Uint8Array(b).buffer as ArrayBuffer;
}

async function run(msg: Extract<ToDatasetsWorker, { type: 'start' }>) {
  try {
    const table = await parseCsv(incoming(), msg.options, { maxBytes: msg.maxBytes, onProgress: (p) => post({ type: 'progress', progress: { phase: 'reading', ...p } }) });
    const prepared = await prepareTable(table, (p) => post({ type: 'progress', progress: p }));
    const chunks = prepared.chunks.map((c) => ({ columnIndex: c.columnIndex, chunkIndex: c.chunkIndex, encoding: c.encoding, payload: own(c.payload) }));
    const done: PreparedMessage = { type: 'done', rowCount: table.rowCount, bytes: table.bytes, options: table.options, columns: prepared.columns, sha256: prepared.sha256, chunkRows: prepared.chunkRows, chunks };
    post(done, chunks.map((c) => c.payload));
  } catch (e) {
    const err = e as { name?: string; code?: unknown; message?: string; path?: unknown };
    if (err?.name === 'AppError' && typeof err.code === 'string') post({ type: 'error', code: err.code, message: err.message ?? '', path: typeof err.path === 'string' ? err.path : '' });
    else post({ type: 'error', code: null, message: String(err?.message ?? e), path: '' });
  }
}

port.on('message', (msg: ToDatasetsWorker) => {
  if (msg.type === 'start') {
    if (started) return;
    started = true;
    void run(msg);
    return;
  }
  queue.push(msg.type === 'chunk' ? new Uint8Array(msg.bytes) : null);
  wake?.();
  wake = null;
});
