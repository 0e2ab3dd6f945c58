import { createRng, drawAll, prepare } from '@/lib/resampling';
import { tallyArena } from '@/lib/resampling/random/tally-kernel';

/**
 * The floor: the cost of only drawing n·B uniform indices with the engine's generator and
 * tallying them (the least any bootstrap of n values with B replicates must do), against
 * the engine's whole replicate loop (draws + median from counts) on the same thread. Both tally
 * with the WebAssembly loop (random/tally-kernel.ts) when it is available.
 * Best of `reps` runs, in milliseconds.
 */
export function measureFloor(request: unknown, reps = 3): { floorMs: number; engineMs: number; draws: number } {
  const problem = prepare(request);
  const n = problem.n;
  const B = problem.request.B;
  // In WebAssembly memory where it can be, as the engine's own count arrays are: the fastest
  // way the engine has to draw and tally.
  const counts = tallyArena(n)?.counts ?? new Int32Array(n);
  let floorMs = Number.POSITIVE_INFINITY;
  let engineMs = Number.POSITIVE_INFINITY;
  let sink = 0;
  for (let r = 0; r < reps; r++) {
    let t = performance.now();
    for (let k = 0; k * 500 < B; k++) {
      const rng = createRng('floor', `chunk:${k}`);
      for (let b = k * 500; b < Math.min(B, (k + 1) * 500); b++) {
        counts.fill(0);
        rng.addCounts(counts, n, n, null);
        sink += counts[b % n];
      }
    }
    floorMs = Math.min(floorMs, performance.now() - t);
    t = performance.now();
    sink += drawAll(problem).theta[0];
    engineMs = Math.min(engineMs, performance.now() - t);
  }
  if (sink === -1) console.log(sink);
  return { floorMs, engineMs, draws: n * B };
}
