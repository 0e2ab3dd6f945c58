import 'server-only';
import { availableParallelism } from 'node:os';
import { EnginePool } from './pool';

/**
 * The process's one engine worker pool, and the decisions about starting it. Kept apart
 * from the engine (it imports none of lib/resampling but its error class), so the command
 * line can start the workers before it loads the engine itself.
 */

export { COMMAND_LINE_WORKER_DRAWS, INLINE_DRAWS, looksLarge } from './early-worker.cjs';

let pool: EnginePool | null = null;
let poolFile: string | null = null;

/** The pool for this worker bundle and size (a new one, and the old closed, when either changes). */
export function poolFor(file: string, threads: number): EnginePool {
  if (!pool || poolFile !== file || pool.size !== threads) {
    void pool?.close();
    pool = new EnginePool(file, threads);
    poolFile = file;
  }
  return pool;
}

/** Closes the worker pool (tests). */
export async function closeComputePool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.close();
}

/** Workers a large job gets by default: one per core, less the calling thread's if it draws too. */
export function defaultWorkers(callerDraws: boolean): number {
  const cores = availableParallelism();
  return callerDraws ? cores - 1 : Math.max(1, cores);
}

/**
 * Starts the worker threads ahead of the first compute() (the command line calls it as soon
 * as the request text is parsed and looks large, so the workers start while the engine is
 * loaded and the request validated and prepared). Only when the worker bundle's path is
 * already known (MARGIN_ENGINE_WORKER), so it never triggers a build.
 */
export function prewarmCompute(threads: number): void {
  const file = process.env.MARGIN_ENGINE_WORKER;
  if (file && threads > 0) poolFor(file, threads).warm();
}

/** The pool, if prewarmCompute started it with this many workers; else null. */
export function warmPoolFor(threads: number): EnginePool | null {
  return pool && pool.size === threads && poolFile === process.env.MARGIN_ENGINE_WORKER ? pool : null;
}
