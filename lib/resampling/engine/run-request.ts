import { parseRequest } from '../contract/parse';
import type { EngineResponse } from '../contract/response';
import type { EngineRequest } from '../contract/schema';
import { EngineError } from '../errors';
import { chunkCount, chunkRange } from '../replicates/chunks';
import { needsInnerSe, runChunk } from '../replicates/run-chunk';
import { finalize } from './finalize';
import { prepareProblem } from './prepare';
import type { Problem } from './problem';

export interface RunOptions {
  onProgress?: (done: number, total: number) => void;
  shouldStop?: () => boolean;
}

/**
 * Runs a request start to finish on the calling thread: parse, prepare, draw every chunk of
 * replicates in order, finalize. Synchronous and pure; `shouldStop` is polled between
 * chunks (throws EngineError `cancelled`). lib/compute runs the same chunks in worker
 * threads and gives a bit-identical response.
 */
export function runRequest(input: unknown, opts: RunOptions = {}): EngineResponse {
  const request = parseRequest(input);
  const problem = prepareProblem(request);
  const { theta, innerSe } = drawAll(problem, opts);
  return finalize(problem, theta, innerSe, opts.shouldStop);
}

export function drawAll(problem: Problem, opts: RunOptions = {}): { theta: Float64Array; innerSe: Float64Array | null } {
  const B = problem.request.B;
  const theta = new Float64Array(B);
  const innerSe = needsInnerSe(problem) ? new Float64Array(B) : null;
  const K = chunkCount(B);
  for (let k = 0; k < K; k++) {
    if (opts.shouldStop?.()) throw new EngineError('cancelled', 'the computation was cancelled', '');
    const r = runChunk(problem, k);
    const [start, end] = chunkRange(B, k);
    theta.set(r.theta, start);
    if (innerSe && r.innerSe) innerSe.set(r.innerSe, start);
    opts.onProgress?.(end, B);
  }
  return { theta, innerSe };
}

/** Parses (if needed) and prepares: shared by runRequest and the worker pool. */
export function prepare(input: unknown | EngineRequest): Problem {
  return prepareProblem(parseRequest(input));
}
