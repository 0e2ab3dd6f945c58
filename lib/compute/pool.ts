import 'server-only';
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { EngineError, type EngineRequest } from '@/lib/resampling';
import type { FromWorker, ToWorker } from './protocol';

interface Job {
  id: number;
  request: EngineRequest;
  total: number;
  pending: number;
  results: (FromWorker & { type: 'done' })[];
  onProgress?: (done: number, total: number) => void;
  resolve: (r: (FromWorker & { type: 'done' })[]) => void;
  reject: (e: unknown) => void;
  done: boolean;
  /** Replicates finished so far (for progress). */
  replicatesDone: number;
  chunkSizes: number[];
}

interface Slot {
  worker: Worker;
  ready: Promise<void>;
  isReady: boolean;
  busy: { job: number; k: number } | null;
  seen: Set<number>;
}

/**
 * A pool of engine worker threads (one per core by default) sharing one queue of
 * (job, chunk) tasks. Workers take the next chunk as soon as they finish one, so uneven
 * chunks balance themselves; results are placed by chunk index, so the response does not
 * depend on which worker drew what. Idle workers are unref'd (a CLI exits when done);
 * a cancelled job's running workers are terminated and replaced lazily.
 */
export class EnginePool {
  private slots: Slot[] = [];
  private queue: { job: Job; k: number }[] = [];
  private jobs = new Map<number, Job>();
  private nextId = 1;

  constructor(
    private readonly file: string,
    readonly size: number = Math.max(1, Math.min(availableParallelism(), 8)),
  ) {}

  /** Draws the given chunks of a request; resolves with one result per chunk, in chunk order. */
  run(
    request: EngineRequest,
    chunkSizes: number[],
    opts: { signal?: AbortSignal; onProgress?: (done: number, total: number) => void; inline?: (k: number) => { theta: Float64Array; innerSe: Float64Array | null } } = {},
  ): Promise<(FromWorker & { type: 'done' })[]> {
    return new Promise((resolve, reject) => {
      const id = this.nextId++;
      const job: Job = {
        id,
        request,
        total: request.B,
        pending: chunkSizes.length,
        results: new Array(chunkSizes.length),
        onProgress: opts.onProgress,
        resolve,
        reject,
        done: false,
        replicatesDone: 0,
        chunkSizes,
      };
      this.jobs.set(id, job);
      const signal = opts.signal;
      if (signal) {
        if (signal.aborted) return this.cancel(job, signal.reason);
        const onAbort = () => this.cancel(job, signal.reason);
        signal.addEventListener('abort', onAbort, { once: true });
        const finish = () => signal.removeEventListener('abort', onAbort);
        job.resolve = (r) => {
          finish();
          resolve(r);
        };
        job.reject = (e) => {
          finish();
          reject(e);
        };
      }
      for (let k = 0; k < chunkSizes.length; k++) this.queue.push({ job, k });
      this.ensureSlots();
      this.dispatch();
      if (opts.inline) void this.helpWhileStarting(job, opts.inline);
    });
  }

  /**
   * While no worker has started yet (a fresh process), the calling thread draws chunks of
   * the job itself, yielding between chunks so worker messages are handled; it stops as soon
   * as a worker is ready, so the cores are not oversubscribed.
   */
  private async helpWhileStarting(job: Job, inline: (k: number) => { theta: Float64Array; innerSe: Float64Array | null }): Promise<void> {
    while (!job.done && !this.slots.some((s) => s.isReady)) {
      const at = this.queue.findIndex((t) => t.job === job);
      if (at < 0) return;
      const [task] = this.queue.splice(at, 1);
      try {
        const r = inline(task.k);
        this.accept(job, { type: 'done', job: job.id, k: task.k, theta: r.theta, innerSe: r.innerSe });
      } catch (e) {
        this.fail(job, e);
        return;
      }
      await new Promise<void>((resolve) => setImmediate(resolve));
    }
  }

  private accept(job: Job, msg: FromWorker & { type: 'done' }): void {
    if (job.done) return;
    job.results[msg.k] = msg;
    job.pending--;
    job.replicatesDone += job.chunkSizes[msg.k];
    job.onProgress?.(job.replicatesDone, job.total);
    if (job.pending === 0) this.complete(job);
  }

  /** Starts the workers now (they load the engine while the caller reads its input). */
  warm(): void {
    this.ensureSlots();
  }

  /** Terminates every worker (tests; servers keep the pool for the process lifetime). */
  async close(): Promise<void> {
    const slots = this.slots;
    this.slots = [];
    await Promise.all(slots.map((s) => s.worker.terminate()));
  }

  private ensureSlots(): void {
    while (this.slots.length < this.size) this.slots.push(this.spawn());
  }

  private spawn(): Slot {
    const worker = new Worker(this.file);
    let markReady!: () => void;
    const slot: Slot = { worker, ready: new Promise<void>((r) => (markReady = r)), isReady: false, busy: null, seen: new Set() };
    worker.unref();
    worker.on('message', (msg: FromWorker) => {
      if (msg.type === 'ready') {
        slot.isReady = true;
        markReady();
        return;
      }
      this.onResult(slot, msg);
    });
    worker.on('error', (err) => this.onCrash(slot, err));
    worker.on('exit', (code) => {
      if (this.slots.includes(slot)) this.onCrash(slot, new Error(`engine worker exited with code ${code}`));
    });
    return slot;
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.busy || !this.queue.length) continue;
      const task = this.queue.shift()!;
      slot.busy = { job: task.job.id, k: task.k };
      slot.worker.ref();
      const msg: ToWorker = { type: 'run', job: task.job.id, k: task.k, request: slot.seen.has(task.job.id) ? undefined : task.job.request };
      slot.seen.add(task.job.id);
      void slot.ready.then(() => slot.worker.postMessage(msg));
    }
  }

  private onResult(slot: Slot, msg: FromWorker): void {
    if (msg.type === 'ready') return;
    slot.busy = null;
    slot.worker.unref();
    const job = this.jobs.get(msg.job);
    if (job && !job.done) {
      if (msg.type === 'error') {
        const e = msg.error.name === 'EngineError' ? new EngineError(msg.error.code ?? 'internal:engine', msg.error.message, msg.error.path ?? '') : new Error(msg.error.message);
        this.fail(job, e);
      } else this.accept(job, msg);
    }
    this.dispatch();
  }

  private complete(job: Job): void {
    job.done = true;
    this.jobs.delete(job.id);
    this.forget(job.id);
    job.resolve(job.results);
  }

  private fail(job: Job, e: unknown): void {
    job.done = true;
    this.jobs.delete(job.id);
    this.queue = this.queue.filter((t) => t.job !== job);
    this.forget(job.id);
    job.reject(e);
  }

  private cancel(job: Job, reason: unknown): void {
    if (job.done) return;
    // Workers in the middle of this job's chunk cannot be interrupted: replace them.
    for (const slot of [...this.slots]) {
      if (slot.busy?.job === job.id) {
        this.slots = this.slots.filter((s) => s !== slot);
        void slot.worker.terminate();
      }
    }
    this.fail(job, reason ?? new DOMException('The computation was aborted.', 'AbortError'));
    if (this.queue.length) {
      this.ensureSlots();
      this.dispatch();
    }
  }

  private forget(id: number): void {
    for (const slot of this.slots) {
      if (slot.seen.delete(id)) void slot.ready.then(() => slot.worker.postMessage({ type: 'forget', job: id } satisfies ToWorker));
    }
  }

  private onCrash(slot: Slot, err: unknown): void {
    if (!this.slots.includes(slot)) return;
    this.slots = this.slots.filter((s) => s !== slot);
    const busy = slot.busy;
    if (busy) {
      const job = this.jobs.get(busy.job);
      if (job) this.fail(job, err instanceof Error ? err : new Error(String(err)));
    }
    if (this.queue.length) {
      this.ensureSlots();
      this.dispatch();
    }
  }
}
