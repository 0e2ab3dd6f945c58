import type { EngineRequest } from '@/lib/resampling';

/** Messages between the pool (main thread) and an engine worker. */
export type ToWorker =
  | { type: 'run'; job: number; k: number; request?: EngineRequest }
  | { type: 'forget'; job: number };

export type FromWorker =
  | { type: 'ready' }
  | { type: 'done'; job: number; k: number; theta: Float64Array; innerSe: Float64Array | null }
  | { type: 'error'; job: number; k: number; error: { name: string; code?: string; message: string; path?: string } };
