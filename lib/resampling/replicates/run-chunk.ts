import type { Problem } from '../engine/problem';
import { bootstrapSeOfResample, jackknifeSeOfResample } from '../jackknife/resample-se';
import { createRng } from '../random/rng';
import { chunkRange } from './chunks';

export interface ChunkResult {
  /** θ* for the chunk's replicates (NaN where undefined). */
  theta: Float64Array;
  /** Inner SE of each replicate, when the studentized interval was asked for. */
  innerSe: Float64Array | null;
}

/** True when the request needs an inner SE per replicate. */
export function needsInnerSe(problem: Problem): boolean {
  return problem.request.intervals.methods.includes('studentized') && problem.scheme.counting !== undefined;
}

/**
 * Draws the replicates of chunk k: for each, the scheme draws a resample and evaluates the
 * statistic; for the studentized interval the same random stream then draws the inner SE
 * (nested bootstrap) or the jackknife of the resample is taken. Pure and deterministic.
 */
export function runChunk(problem: Problem, k: number): ChunkResult {
  const [start, end] = chunkRange(problem.request.B, k);
  const theta = new Float64Array(end - start);
  const innerSe = needsInnerSe(problem) ? new Float64Array(end - start) : null;
  drawChunk(problem, k, theta, innerSe, 0);
  return { theta, innerSe };
}

/**
 * The same draws as runChunk, written in place: replicate b of chunk k (global index
 * start + b) goes to theta[start + b] (and innerSe), for arrays of length B. Worker threads
 * write straight into one shared array this way, so replicates are never copied between
 * threads.
 */
export function runChunkInto(problem: Problem, k: number, theta: Float64Array, innerSe: Float64Array | null): void {
  drawChunk(problem, k, theta, innerSe, chunkRange(problem.request.B, k)[0]);
}

function drawChunk(problem: Problem, k: number, theta: Float64Array, innerSe: Float64Array | null, offset: number): void {
  const { B, seed } = problem.request;
  const [start, end] = chunkRange(B, k);
  const count = end - start;
  const rng = createRng(seed, `chunk:${k}`);
  const scheme = problem.scheme;
  if (!needsInnerSe(problem)) {
    if (scheme.replicateMany?.(rng, theta, offset, count)) return;
    for (let b = 0; b < count; b++) theta[offset + b] = scheme.replicate(rng);
    return;
  }
  if (!innerSe) throw new Error('runChunkInto: the studentized interval needs an innerSe array');
  const counting = scheme.counting!;
  const stat = problem.statistic;
  const n = problem.n;
  const opts = problem.request.intervals.studentized;
  const scratch = new Float64Array(n);
  const pool = new Int32Array(n);
  const inner = new Int32Array(n);
  for (let b = 0; b < count; b++) {
    theta[offset + b] = scheme.replicate(rng);
    innerSe[offset + b] =
      opts.se === 'bootstrap'
        ? bootstrapSeOfResample(stat, counting.strata, counting.counts, n, opts.innerB, rng, pool, inner)
        : jackknifeSeOfResample(stat, counting.strata, counting.counts, n, scratch);
  }
}
