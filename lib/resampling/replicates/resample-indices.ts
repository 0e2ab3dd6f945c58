import type { Problem } from '../engine/problem';
import { EngineError } from '../errors';
import { createRng } from '../random/rng';
import { CHUNK_SIZE, chunkCount, chunkRange } from './chunks';

/**
 * The unit indices of every resample the engine draws for a request, replicate by
 * replicate (B rows of n indices, 0-based units of the cleaned data), using exactly the
 * random draws of runChunk — so another program (R's boot, in the reference tests) can
 * recompute each replicate from the same resamples and the results can be compared
 * exactly. Counting schemes only, without the studentized interval (whose inner draws
 * interleave). Cost n·B draws and 4·n·B bytes.
 */
export function resampleIndices(problem: Problem, B = problem.request.B): Int32Array {
  const counting = problem.scheme.counting;
  if (!counting) throw new EngineError('unsupported:indices', 'this scheme does not resample rows', 'scheme');
  const n = problem.n;
  const out = new Int32Array(B * n);
  const row = new Int32Array(n);
  for (let k = 0; k < chunkCount(B); k++) {
    const rng = createRng(problem.request.seed, `chunk:${k}`);
    const [start, end] = chunkRange(B, k);
    for (let b = start; b < end; b++) {
      counting.drawIndices(rng, row);
      out.set(row, b * n);
    }
  }
  return out;
}

