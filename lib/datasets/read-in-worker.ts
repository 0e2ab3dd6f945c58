import 'server-only';
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { AppError } from '@/lib/errors';
import type { ReadOptions } from './options';
import type { ParseProgress } from './parse';
import type { PreparedTable, PrepareProgress } from './prepare';
import { datasetsWorkerFile } from './worker-file';
import type { FromDatasetsWorker, ToDatasetsWorker } from './worker-protocol';

export type ReadProgress = ({ phase: 'reading' } & ParseProgress) | PrepareProgress;

export interface ReadTable extends PreparedTable {
  options: ReadOptions;
  bytes: number;
}

// Chunks posted but not yet taken in by the parser. Enough to keep the worker busy while the
// next chunk arrives from the network, few enough that a file never piles up in memory.
const IN_FLIGHT = 8;
// Uploads read at the same time; more wait their turn (each worker uses a core while it parses).
const MAX_WORKERS = Math.max(1, Math.min(availableParallelism(), 4));
let running = 0;
const waiting: (() => void)[] = [];

async function slot(signal?: AbortSignal): Promise<() => void> {
  if (running >= MAX_WORKERS) {
    await new Promise<void>((resolve, reject) => {
      const go = () => {
        signal?.removeEventListener('abort', stop);
        resolve();
      };
      const stop = () => {
        const i = waiting.indexOf(go);
        if (i >= 0) waiting.splice(i, 1);
        reject(cancelled());
      };
      waiting.push(go);
      signal?.addEventListener('abort', stop, { once: true });
    });
  }
  running++;
  let freed = false;
  return () => {
    if (freed) return;
    freed = true;
    running--;
    waiting.shift()?.();
  };
}

/**
 * The source's chunks until `signal` aborts: a read waiting on a stalled connection is not
 * waited for once the uploader has cancelled.
 */
async function* untilAborted(source: AsyncIterable<Uint8Array>, signal?: AbortSignal): AsyncGenerator<Uint8Array> {
  if (!signal) return yield* source;
  const it = source[Symbol.asyncIterator]();
  const aborted = new Promise<never>((_, reject) => signal.addEventListener('abort', () => reject(cancelled()), { once: true }));
  aborted.catch(() => {});
  try {
    for (;;) {
      const next = await Promise.race([it.next(), aborted]);
      if (next.done) return;
      yield next.value;
    }
  } finally {
    // Not awaited: a pending read ends when the connection closes.
    void it.return?.()?.catch?.(() => {});
  }
}

function cancelled() {
  return new AppError('bad_request:dataset', 'The upload was cancelled. Nothing was stored.', 'file');
}

/**
 * Reads a CSV byte stream in a worker thread (lib/datasets/worker-entry.ts): the chunks are
 * posted as they arrive (copied once and transferred, never shared), parsing, typing,
 * summarising, hashing and encoding happen there, and the prepared table comes back with its
 * chunk payloads transferred. The web server's event loop only moves bytes, so other
 * requests keep being answered during a 50 MB upload. Errors are the parser's AppErrors,
 * unchanged; an abort (`signal`) ends the worker at once.
 */
export async function readCsvInWorker(
  source: AsyncIterable<Uint8Array>,
  options: Partial<ReadOptions> = {},
  opts: { onProgress?: (p: ReadProgress) => void; signal?: AbortSignal; maxBytes?: number } = {},
): Promise<ReadTable> {
  const { signal } = opts;
  signal?.throwIfAborted();
  const file = await datasetsWorkerFile();
  const release = await slot(signal);
  const worker = new Worker(file);
  let failed: unknown = null;
  let acked: (() => void) | null = null;
  let inFlight = 0;

  const result = new Promise<ReadTable>((resolve, reject) => {
    worker.on('message', (m: FromDatasetsWorker) => {
      if (m.type === 'ack') {
        inFlight--;
        acked?.();
        acked = null;
      } else if (m.type === 'progress') opts.onProgress?.(m.progress);
      else if (m.type === 'done') {
        resolve({
          rowCount: m.rowCount,
          bytes: m.bytes,
          options: m.options,
          columns: m.columns,
          sha256: m.sha256,
          chunkRows: m.chunkRows,
          chunks: m.chunks.map((c) => ({ columnIndex: c.columnIndex, chunkIndex: c.chunkIndex, encoding: c.encoding, payload: Buffer.from(c.payload) })),
        });
      } else {
        reject(m.code ? new AppError(m.code as `invalid:${string}`, m.message, m.path) : new Error(`datasets worker: ${m.message}`));
      }
    });
    worker.on('error', reject);
    worker.on('exit', (code) => reject(new Error(`datasets worker stopped (exit code ${code})`)));
  });
  // Whatever ends first — the result, a parse error, an abort — stops the sending loop.
  result.catch((e) => {
    failed ??= e;
    acked?.();
  });
  const onAbort = () => {
    failed ??= cancelled();
    acked?.();
    void worker.terminate();
  };
  signal?.addEventListener('abort', onAbort, { once: true });
  const send = (m: ToDatasetsWorker, transfer: ArrayBuffer[] = []) => worker.postMessage(m, transfer);

  try {
    send({ type: 'start', options, maxBytes: opts.maxBytes });
    try {
      for await (const chunk of untilAborted(source, signal)) {
        if (failed) break;
        // A copy the worker may own: request chunks can be views into buffers Node reuses
        // (new Uint8Array(view) copies; Buffer#slice would not).
        const copy = new Uint8Array(chunk);
        send({ type: 'chunk', bytes: copy.buffer as ArrayBuffer }, [copy.buffer as ArrayBuffer]);
        inFlight++;
        while (inFlight >= IN_FLIGHT && !failed) await new Promise<void>((r) => (acked = r));
        if (failed) break;
      }
    } catch (e) {
      // The request body broke off (the client went away or cancelled).
      if (!failed) throw signal?.aborted ? cancelled() : new AppError('bad_request:dataset', 'The upload was interrupted before the whole file arrived. Nothing was stored; please try again.', 'file');
      void e;
    }
    if (failed) throw failed;
    send({ type: 'end' });
    const aborted = new Promise<never>((_, reject) => signal?.addEventListener('abort', () => reject(cancelled()), { once: true }));
    aborted.catch(() => {});
    return await Promise.race([result, aborted]);
  } finally {
    signal?.removeEventListener('abort', onAbort);
    release();
    void worker.terminate();
  }
}
