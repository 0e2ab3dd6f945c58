import 'server-only';
import { availableParallelism } from 'node:os';
import {
  chunkCount,
  chunkRange,
  drawAll,
  type EngineResponse,
  EngineError,
  finalize,
  parseRequest,
  prepareProblem,
  type Problem,
  runChunk,
} from '@/lib/resampling';
import { EnginePool } from './pool';
import { workerFile } from './worker-file';

export interface ComputeOptions {
  signal?: AbortSignal;
  onProgress?: (done: number, total: number) => void;
  /** Worker threads to use; 0 runs on the calling thread. Default: inline for small jobs, else one per core. */
  threads?: number;
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
  const threads = opts.threads ?? (drawsOf(problem) < INLINE_DRAWS ? 0 : Math.max(1, availableParallelism()));
  let drawn: { theta: Float64Array; innerSe: Float64Array | null };
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

/**
 * Starts the worker threads ahead of the first compute() (the CLI calls it before reading
 * its input, so the workers load the engine meanwhile). Only when the worker bundle's path
 * is already known (MARGIN_ENGINE_WORKER), so it never triggers a build.
 */
export function prewarmCompute(threads = Math.max(1, availableParallelism())): void {
  const file = process.env.MARGIN_ENGINE_WORKER;
  if (file) poolFor(file, threads).warm();
}

async function drawInWorkers(problem: Problem, threads: number, opts: ComputeOptions): Promise<{ theta: Float64Array; innerSe: Float64Array | null }> {
  const file = await workerFile();
  const pool = poolFor(file, threads);
  const B = problem.request.B;
  const K = chunkCount(B);
  const sizes = Array.from({ length: K }, (_, k) => {
    const [a, b] = chunkRange(B, k);
    return b - a;
  });
  const results = await pool.run(problem.request, sizes, { signal: opts.signal, onProgress: opts.onProgress, inline: (k) => runChunk(problem, k) });
  const theta = new Float64Array(B);
  const withInner = results[0]?.innerSe != null;
  const innerSe = withInner ? new Float64Array(B) : null;
  for (let k = 0; k < K; k++) {
    const [start] = chunkRange(B, k);
    theta.set(results[k].theta, start);
    if (innerSe && results[k].innerSe) innerSe.set(results[k].innerSe!, start);
  }
  return { theta, innerSe };
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
