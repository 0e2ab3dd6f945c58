// Seconds inside the computation alone for bench/structured.ts: the engine's runRequest on this
// thread, once untimed (V8 compiles the hot loops), then `REPS` timed runs; prints the median.
// A process of its own for each case: timed in the benchmark's process, after the other
// cases and the resampling benchmark had run there, the same request took twice as long
// (the hot functions had been compiled for other requests' shapes and data).
//   node --import tsx bench/structured/inside.ts REQUEST.json [REPS]
import { readFileSync } from 'node:fs';
import { runRequest } from '@/lib/resampling';

const body = JSON.parse(readFileSync(process.argv[2], 'utf8'));
const reps = Number(process.argv[3] ?? 3);
runRequest(body);
const runs: number[] = [];
for (let i = 0; i < reps; i++) {
  const t0 = performance.now();
  runRequest(body);
  runs.push((performance.now() - t0) / 1000);
}
runs.sort((a, b) => a - b);
console.log(runs[(runs.length - 1) >> 1]);
