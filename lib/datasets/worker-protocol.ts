import type { ColumnMeta } from '@/db/tables/datasets';
import type { ReadOptions } from './options';
import type { ParseProgress } from './parse';
import type { PrepareProgress } from './prepare';

/**
 * Messages between the web server and the datasets worker (lib/datasets/worker-entry.ts).
 * Bytes go in as transferred ArrayBuffers, one per upload chunk; the worker answers each
 * with `ack` (so the server keeps only a few chunks in flight: the worker never holds a
 * whole 50 MB file), reports progress, and ends with the prepared table, its chunk payloads
 * transferred back, or with an error.
 */
export type ToDatasetsWorker =
  | { type: 'start'; options: Partial<ReadOptions>; maxBytes?: number }
  | { type: 'chunk'; bytes: ArrayBuffer }
  | { type: 'end' };

export interface PreparedMessage {
  type: 'done';
  rowCount: number;
  bytes: number;
  options: ReadOptions;
  columns: ColumnMeta[];
  sha256: string;
  chunkRows: number;
  chunks: { columnIndex: number; chunkIndex: number; encoding: 'f64' | 'json'; payload: ArrayBuffer }[];
}

export type FromDatasetsWorker =
  | { type: 'ack' }
  | { type: 'progress'; progress: ({ phase: 'reading' } & ParseProgress) | PrepareProgress }
  | PreparedMessage
  /** `code` set: an AppError to pass on as it is (bad file, too large); else an internal failure. */
  | { type: 'error'; code: string | null; message: string; path: string };
