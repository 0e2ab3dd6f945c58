import type { EngineRequest } from '@/lib/resampling';

/**
 * Messages between the pool (main thread) and an engine worker.
 *
 * A job's chunks are claimed through a shared counter rather than sent one by one:
 * `control` is an Int32Array over a SharedArrayBuffer, control[CLAIMED] the next chunk
 * index to draw (Atomics.add hands out each index once, to whichever thread asks first) and
 * control[FINISHED] the number of chunks written. Replicates go straight into `theta` (and
 * `innerSe`), Float64Arrays of length B over SharedArrayBuffers, at their chunk's place — no
 * copy between threads. A worker posts `chunk` after each chunk and `idle` when no chunk of
 * the job is left to claim.
 */
export const CLAIMED = 0;
export const FINISHED = 1;

export interface JobBuffers {
  control: SharedArrayBuffer;
  theta: SharedArrayBuffer;
  innerSe: SharedArrayBuffer | null;
  /** Number of chunks in the job. */
  chunks: number;
}

export type ToWorker = { type: 'run'; job: number; request: EngineRequest; buffers: JobBuffers };

export type FromWorker =
  | { type: 'ready' }
  | { type: 'chunk'; job: number; k: number }
  | { type: 'idle'; job: number }
  | { type: 'error'; job: number; k: number; error: { name: string; code?: string; message: string; path?: string } };
