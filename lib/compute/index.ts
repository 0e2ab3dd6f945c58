import 'server-only';
import { availableParallelism } from 'node:os';
import { chunkCount, chunkRange, drawAll, type EngineResponse, EngineError, finalize, parseRequest, prepareProblem, type Problem } from '@/lib/resampling';
import { needsInnerSe, runChunkInto } from '@/lib/resampling/replicates/run-chunk';
import { type Drawn, EnginePool } from './pool';
import { workerFile } from './worker-file';

export interface ComputeOptions {
  signal?: AbortSignal;
  onProgress?: (done: number, total: number) => void;
  /**
   * Worker threads to use; 0 runs on the calling thread. Default: inline for small jobs,
   * else one per core — or one per core but one when the calling thread draws too.
   */
  threads?: number;
  /**
   * The calling thread draws chunks alongside the workers until none is left (the command
   * line: its thread has nothing else to do, so with one worker fewer both cores still draw
   * and no thread waits). Otherwise (a server) it draws only until the first worker is up.
   */
  callerDraws?: boolean;
}

/** Below this many index draws a job runs on the calling thread (starting workers would cost more). */
export const INLINE_DRAWS = 2_000_000;

let pool: EnginePool | null = null;
let poolFile: string | null = null;

/**
 * Runs an engine request with its replicates spread over worker threads (one per core),
 * then finalizes on this thread. Same response as runRequest — bit-identical, since chunk
 * k is always drawn from the stream (seed, k) and results are placed by chunk index.
 * Rejects with EngineError for bad input, with the signal's reason (an AbortError) when
 * aborted.
 */
export async function compute(input: unknown, opts: ComputeOptions = {}): Promise<EngineResponse> {
  const request = parseRequest(input);
  const problem = prepareProblem(request);
  const signal = opts.signal;
  if (signal?.aborted) throw abortReason(signal);
  const threads = opts.threads ?? (drawsOf(problem) < INLINE_DRAWS ? 0 : defaultWorkers(opts.callerDraws === true));
  let drawn: Drawn;
  if (threads === 0) {
    try {
      drawn = drawAll(problem, { onProgress: opts.onProgress, shouldStop: () => signal?.aborted === true });
    } catch (e) {
      if (e instanceof EngineError && e.code === 'cancelled' && signal?.aborted) throw abortReason(signal);
      throw e;
    }
  } else {
    drawn = await drawInWorkers(problem, threads, opts);
  }
  if (signal?.aborted) throw abortReason(signal);
  return finalize(problem, drawn.theta, drawn.innerSe, () => signal?.aborted === true);
}

function poolFor(file: string, threads: number): EnginePool {
  if (!pool || poolFile !== file || pool.size !== threads) {
    void pool?.close();
    pool = new EnginePool(file, threads);
    poolFile = file;
  }
  return pool;
}

/** Workers a large job gets by default: one per core, less the calling thread's if it draws too. */
export function defaultWorkers(callerDraws: boolean): number {
  const cores = availableParallelism();
  return callerDraws ? cores - 1 : Math.max(1, cores);
}

/**
 * Starts the worker threads ahead of the first compute() (the CLI calls it once the request
 * text is parsed and looks large, so the workers start while the request is validated and
 * prepared). Only when the worker bundle's path is already known (MARGIN_ENGINE_WORKER), so
 * it never triggers a build.
 */
export function prewarmCompute(threads: number): void {
  const file = process.env.MARGIN_ENGINE_WORKER;
  if (file && threads > 0) poolFor(file, threads).warm();
}

/**
 * A cheap guess, before validation, whether a request will go to worker threads: B times
 * the longest data column against INLINE_DRAWS. Only decides whether to start workers
 * early; compute() decides from the prepared request.
 */
export function looksLarge(input: unknown): boolean {
  if (!input || typeof input !== 'object') return false;
  const { B, data } = input as { B?: unknown; data?: unknown };
  if (typeof B !== 'number' || !data || typeof data !== 'object') return false;
  let n = 0;
  for (const column of Object.values(data)) if (Array.isArray(column)) n = Math.max(n, column.length);
  return n * B >= INLINE_DRAWS;
}

async function drawInWorkers(problem: Problem, threads: number, opts: ComputeOptions): Promise<Drawn> {
  const file = await workerFile();
  const pool = poolFor(file, threads);
  const B = problem.request.B;
  const sizes = Array.from({ length: chunkCount(B) }, (_, k) => {
    const [a, b] = chunkRange(B, k);
    return b - a;
  });
  return pool.run(problem.request, sizes, needsInnerSe(problem), {
    signal: opts.signal,
    onProgress: opts.onProgress,
    inline: (k, theta, innerSe) => runChunkInto(problem, k, theta, innerSe),
    callerDraws: opts.callerDraws ? 'always' : 'while-starting',
  });
}

/** Closes the worker pool (tests). */
export async function closeComputePool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.close();
}

function drawsOf(problem: Problem): number {
  const { B, intervals } = problem.request;
  const inner = intervals.methods.includes('studentized') ? (intervals.studentized.se === 'bootstrap' ? intervals.studentized.innerB : problem.n) : 0;
  return problem.n * B * (1 + inner);
}

function abortReason(signal: AbortSignal): unknown {
  return signal.reason ?? new DOMException('The computation was aborted.', 'AbortError');
}
