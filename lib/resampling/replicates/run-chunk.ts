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
  const { B, seed } = problem.request;
  const [start, end] = chunkRange(B, k);
  const count = end - start;
  const rng = createRng(seed, `chunk:${k}`);
  const theta = new Float64Array(count);
  const scheme = problem.scheme;
  if (!needsInnerSe(problem)) {
    for (let b = 0; b < count; b++) theta[b] = scheme.replicate(rng);
    return { theta, innerSe: null };
  }
  const innerSe = new Float64Array(count);
  const counting = scheme.counting!;
  const stat = problem.statistic;
  const n = problem.n;
  const opts = problem.request.intervals.studentized;
  const scratch = new Float64Array(n);
  const pool = new Int32Array(n);
  const inner = new Int32Array(n);
  for (let b = 0; b < count; b++) {
    theta[b] = scheme.replicate(rng);
    innerSe[b] =
      opts.se === 'bootstrap'
        ? bootstrapSeOfResample(stat, counting.strata, counting.counts, n, opts.innerB, rng, pool, inner)
        : jackknifeSeOfResample(stat, counting.strata, counting.counts, n, scratch);
  }
  return { theta, innerSe };
}
