/**
 * Engine worker thread: for each job it is given, prepares the job's Problem (the same
 * deterministic preparation as the main thread), then claims chunks from the job's shared
 * counter and draws them straight into the job's shared replicate arrays until none is left
 * (protocol.ts). Bundled to dist/engine/worker.cjs (build-engine.mjs).
 */
import { parentPort } from 'node:worker_threads';
import { prepareProblem } from '@/lib/resampling/engine/prepare';
import { runChunkInto } from '@/lib/resampling/replicates/run-chunk';
import { CLAIMED, FINISHED, type FromWorker, type ToWorker } from './protocol';
import { trace, traced } from './trace';

const port = parentPort!;

trace('worker:loaded');

port.on('message', (msg: ToWorker) => {
  const { control: sab, theta: thetaSab, innerSe: innerSab, chunks } = msg.buffers;
  const control = new Int32Array(sab);
  let k = -1;
  try {
    // The other threads may have drawn every chunk while this one was starting.
    if (Atomics.load(control, CLAIMED) < chunks) {
      const problem = prepareProblem(msg.request);
      trace('worker:prepared');
      const theta = new Float64Array(thetaSab);
      const innerSe = innerSab ? new Float64Array(innerSab) : null;
      while ((k = Atomics.add(control, CLAIMED, 1)) < chunks) {
        const chunk = k;
        traced(`worker:chunk ${chunk}`, () => runChunkInto(problem, chunk, theta, innerSe));
        Atomics.add(control, FINISHED, 1);
        port.postMessage({ type: 'chunk', job: msg.job, k } satisfies FromWorker);
      }
    }
  } catch (e) {
    const err = e as { name?: string; code?: string; message?: string; path?: string };
    const out: FromWorker = { type: 'error', job: msg.job, k, error: { name: err.name ?? 'Error', code: err.code, message: err.message ?? String(e), path: err.path } };
    port.postMessage(out);
  }
  port.postMessage({ type: 'idle', job: msg.job } satisfies FromWorker);
});

port.postMessage({ type: 'ready' } satisfies FromWorker);
