/**
 * Engine worker thread: prepares each job's Problem once (the same deterministic
 * preparation as the main thread) and draws the replicate chunks it is sent, posting the
 * typed arrays back without copying. Bundled to dist/engine/worker.mjs (build-engine.mjs).
 */
import { parentPort } from 'node:worker_threads';
import { prepareProblem } from '@/lib/resampling/engine/prepare';
import type { Problem } from '@/lib/resampling/engine/problem';
import { runChunk } from '@/lib/resampling/replicates/run-chunk';
import type { FromWorker, ToWorker } from './protocol';

const problems = new Map<number, Problem>();
const port = parentPort!;

port.on('message', (msg: ToWorker) => {
  if (msg.type === 'forget') {
    problems.delete(msg.job);
    return;
  }
  try {
    let problem = problems.get(msg.job);
    if (!problem) {
      if (!msg.request) throw new Error(`job ${msg.job} was not sent to this worker`);
      problem = prepareProblem(msg.request);
      problems.set(msg.job, problem);
    }
    const r = runChunk(problem, msg.k);
    const out: FromWorker = { type: 'done', job: msg.job, k: msg.k, theta: r.theta, innerSe: r.innerSe };
    port.postMessage(out, (r.innerSe ? [r.theta.buffer, r.innerSe.buffer] : [r.theta.buffer]) as ArrayBuffer[]);
  } catch (e) {
    const err = e as { name?: string; code?: string; message?: string; path?: string };
    const out: FromWorker = { type: 'error', job: msg.job, k: msg.k, error: { name: err.name ?? 'Error', code: err.code, message: err.message ?? String(e), path: err.path } };
    port.postMessage(out);
  }
});

port.postMessage({ type: 'ready' } satisfies FromWorker);
