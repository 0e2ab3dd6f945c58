import 'server-only';
import type { RunView } from './types';
import { jobOfRun } from './jobs';
import { getRunView } from './service';

const TICK_MS = 100;
const HEARTBEAT_MS = 15_000;

const inProgress = (state: string) => state === 'queued' || state === 'running';

/** The run as the client sees it (without the lab and memo ids). */
function publicView(v: RunView & { labId?: number; memoId?: number }): RunView {
  const { labId: _l, memoId: _m, ...rest } = v;
  return rest;
}

/**
 * A run's progress as server-sent events (the WHATWG HTML "Server-sent events" format):
 * `event: progress` with `{ id, state, progress }` whenever the computation's progress moves
 * (read from the in-process job every 100 ms — no database reads while it computes), then
 * one `event: run` with the whole run view once it is current, failed, stale or cancelled,
 * and the stream ends. A run that is not computing gets its `run` event at once. Comment
 * lines every 15 s keep idle proxies from closing a long run's stream. The caller has
 * authorized `memo:read` on the run's lab; `signal` ends the stream when the client leaves.
 */
export function runEventStream(runId: number, signal?: AbortSignal): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  let closed = false;
  return new ReadableStream<Uint8Array>({
    async start(controller) {
      const send = (text: string) => {
        if (!closed) controller.enqueue(encoder.encode(text));
      };
      const event = (name: string, data: unknown) => send(`event: ${name}\ndata: ${JSON.stringify(data)}\n\n`);
      try {
        send('retry: 1000\n\n');
        let view = await getRunView(runId);
        const job = jobOfRun(runId);
        if (view && inProgress(view.state) && job) {
          let beat = performance.now();
          let last = job.progress;
          event('progress', { id: runId, state: view.state, progress: last });
          let finished = false;
          void job.done.then(() => (finished = true));
          while (!closed && !signal?.aborted && !finished && jobOfRun(runId) === job) {
            await Promise.race([job.done, new Promise((r) => setTimeout(r, TICK_MS))]);
            if (job.progress !== last && !finished) {
              last = job.progress;
              event('progress', { id: runId, state: 'running', progress: last });
            }
            if (performance.now() - beat > HEARTBEAT_MS) {
              beat = performance.now();
              send(': still computing\n\n');
            }
          }
          view = await getRunView(runId);
        }
        if (view) event('run', publicView(view));
        else event('gone', { id: runId });
      } catch (e) {
        console.error('[margin] run event stream failed', e);
        // Not named "error": EventSource reserves that name for its own connection errors.
        event('failure', { code: 'internal:run', message: 'The progress stream failed; the page asks for the result again.' });
      }
      if (!closed) {
        closed = true;
        controller.close();
      }
    },
    cancel() {
      closed = true;
    },
  });
}
