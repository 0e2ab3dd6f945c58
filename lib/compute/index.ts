import 'server-only';
import { chunkCount, chunkRange, drawAll, type EngineResponse, EngineError, finalize, parseRequest, prepareProblem, type Problem } from '@/lib/resampling';
import { needsInnerSe, runChunkInto } from '@/lib/resampling/replicates/run-chunk';
import { dataDigest } from './data-digest';
import type { Drawn } from './pool';
import { closeComputePool, COMMAND_LINE_WORKER_DRAWS, defaultWorkers, INLINE_DRAWS, poolFor, warmPoolFor } from './shared-pool';
import { trace } from './trace';
import { workerFile } from './worker-file';

export { closeComputePool, defaultWorkers, INLINE_DRAWS, looksLarge, prewarmCompute } from './shared-pool';

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
  /**
   * Stop the worker threads as soon as the replicates are in (the command line, which exits
   * next): they are then torn down while this thread finalizes, not at exit (~4 ms here).
   */
  releaseWorkers?: boolean;
}

/**
 * Runs an engine request with its replicates spread over worker threads (one per core),
 * then finalizes on this thread. Same response as runRequest — bit-identical, since chunk
 * k is always drawn from the stream (seed, k) and results are placed by chunk index.
 * Rejects with EngineError for bad input, with the signal's reason (an AbortError) when
 * aborted.
 */
export async function compute(input: unknown, opts: ComputeOptions = {}): Promise<EngineResponse> {
  const request = parseRequest(input);
  trace('compute:validated');
  const signal = opts.signal;
  // Workers already started for this request (the command line starts them when the request
  // looks large): post the job to them now, so that they prepare the problem while this
  // thread prepares its own copy, instead of waiting idle for it.
  const early = !signal && opts.callerDraws === true && opts.threads === undefined ? warmPoolFor(defaultWorkers(true)) : null;
  let earlyJob: { drawn: Promise<Drawn>; setInline: (f: InlineDraw | null) => void } | null = null;
  if (early) {
    let setInline!: (f: InlineDraw | null) => void;
    const inlineLater = new Promise<InlineDraw | null>((resolve) => (setInline = resolve));
    const drawnEarly = early.run(request, chunkSizes(request.B), request.intervals.methods.includes('studentized'), { onProgress: opts.onProgress, inlineLater, callerDraws: 'always' });
    drawnEarly.catch(() => {});
    earlyJob = { drawn: drawnEarly, setInline };
  }
  let problem: Problem;
  try {
    problem = prepareProblem(request);
    trace('compute:prepared');
  } catch (e) {
    earlyJob?.setInline(null);
    throw e;
  }
  if (signal?.aborted) throw abortReason(signal);
  // Without workers below a size: a server's pool is started once and kept, the command line's
  // would start cold for this one job (early-worker.cjs says when that pays).
  const minDraws = opts.callerDraws === true ? COMMAND_LINE_WORKER_DRAWS : INLINE_DRAWS;
  const threads = earlyJob ? -1 : (opts.threads ?? (drawsOf(problem) < minDraws ? 0 : defaultWorkers(opts.callerDraws === true)));
  let drawn: Drawn;
  let digest: string | undefined;
  if (earlyJob) {
    earlyJob.setInline((k, theta, innerSe) => runChunkInto(problem, k, theta, innerSe));
    digest = dataDigest(request.data);
    const d = await earlyJob.drawn;
    // The inner-SE array was made whenever the studentized interval was asked for; a scheme
    // without one leaves it unused, as runRequest does.
    drawn = { theta: d.theta, innerSe: needsInnerSe(problem) ? d.innerSe : null };
  } else if (threads === 0) {
    try {
      drawn = drawAll(problem, { onProgress: opts.onProgress, shouldStop: () => signal?.aborted === true });
    } catch (e) {
      if (e instanceof EngineError && e.code === 'cancelled' && signal?.aborted) throw abortReason(signal);
      throw e;
    }
  } else {
    const pending = drawInWorkers(problem, threads, opts);
    // Hashed while the workers draw (this thread's chunks wait for it), not after the draws
    // when this thread alone is working.
    digest = dataDigest(request.data);
    drawn = await pending;
  }
  if (signal?.aborted) throw abortReason(signal);
  trace('compute:drawn');
  if (opts.releaseWorkers) void closeComputePool();
  const response = finalize(problem, drawn.theta, drawn.innerSe, () => signal?.aborted === true, digest ?? dataDigest(request.data));
  trace('compute:finalized');
  return response;
}

async function drawInWorkers(problem: Problem, threads: number, opts: ComputeOptions): Promise<Drawn> {
  const file = await workerFile();
  const pool = poolFor(file, threads);
  return pool.run(problem.request, chunkSizes(problem.request.B), needsInnerSe(problem), {
    signal: opts.signal,
    onProgress: opts.onProgress,
    inline: (k, theta, innerSe) => runChunkInto(problem, k, theta, innerSe),
    callerDraws: opts.callerDraws ? 'always' : 'while-starting',
  });
}

type InlineDraw = (k: number, theta: Float64Array, innerSe: Float64Array | null) => void;

function chunkSizes(B: number): number[] {
  return Array.from({ length: chunkCount(B) }, (_, k) => {
    const [a, b] = chunkRange(B, k);
    return b - a;
  });
}

/** The job's work in index draws (or what the scheme states a replicate costs instead); exported for a test. */
export function drawsOf(problem: Problem): number {
  const { B, intervals } = problem.request;
  const inner = intervals.methods.includes('studentized') ? (intervals.studentized.se === 'bootstrap' ? intervals.studentized.innerB : problem.n) : 0;
  // a scheme with a cheaper replicate (block sums, cluster sums) says how much work one costs
  return (problem.scheme.workPerReplicate ?? problem.n) * B * (1 + inner);
}

function abortReason(signal: AbortSignal): unknown {
  return signal.reason ?? new DOMException('The computation was aborted.', 'AbortError');
}
