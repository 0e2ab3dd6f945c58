/**
 * Phase marks for performance work: with MARGIN_TRACE=1 in the environment, the command line,
 * the compute pool and the engine workers print `label time` lines on stderr, the time in
 * epoch milliseconds (performance.timeOrigin + performance.now()), so marks from worker threads
 * and from a parent process that started the command line fall on one clock. bench/README.md
 * shows how the benchmark's timeline was read from them. Off by default: one environment
 * read per thread. Written straight to file descriptor 2: a worker thread's process.stderr
 * goes through the main thread, and its last lines were lost when the worker was stopped.
 */
import { writeSync } from 'node:fs';

const on = process.env.MARGIN_TRACE === '1';

export function trace(label: string): void {
  if (on) writeSync(2, `${label} ${(performance.timeOrigin + performance.now()).toFixed(1)}\n`);
}

/** Runs f and, when tracing, marks its end with its duration. */
export function traced<T>(label: string, f: () => T): T {
  if (!on) return f();
  const t0 = performance.now();
  const out = f();
  trace(`${label} ${(performance.now() - t0).toFixed(1)}ms`);
  return out;
}
