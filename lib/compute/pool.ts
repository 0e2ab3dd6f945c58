import 'server-only';
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { EngineRequest } from '@/lib/resampling';
import { EngineError } from '@/lib/resampling/errors';
import { takeEarlyWorker } from './early-worker.cjs';
import { CLAIMED, FINISHED, type FromWorker, type JobBuffers, type ToWorker } from './protocol';
import { trace, traced } from './trace';

export interface Drawn {
  theta: Float64Array;
  innerSe: Float64Array | null;
}

export interface RunOptions {
  signal?: AbortSignal;
  onProgress?: (done: number, total: number) => void;
  /** Draws chunk k on the calling thread, into the job's arrays. */
  inline?: (k: number, theta: Float64Array, innerSe: Float64Array | null) => void;
  /**
   * When the calling thread draws too: 'always' (a command line, whose thread has nothing
   * else to do: it draws alongside the workers until no chunk is left) or 'while-starting'
   * (a server: only until the first worker is up, so its event loop is soon free again).
   */
  callerDraws?: 'always' | 'while-starting';
  /**
   * Instead of inline: the calling thread's draw function once it is known. The job can then
   * be posted to the workers before the caller has prepared its own copy of the problem, so
   * the workers prepare theirs at the same time. Null: the caller does not draw.
   */
  inlineLater?: Promise<RunOptions['inline'] | null>;
}

interface Job {
  id: number;
  request: EngineRequest;
  buffers: JobBuffers;
  control: Int32Array;
  theta: Float64Array;
  innerSe: Float64Array | null;
  chunkSizes: number[];
  total: number;
  finished: number;
  replicatesDone: number;
  onProgress?: (done: number, total: number) => void;
  resolve: (r: Drawn) => void;
  reject: (e: unknown) => void;
  done: boolean;
}

interface Slot {
  worker: Worker;
  /** The worker has started (posted 'ready'). */
  isReady: boolean;
  /** The job this worker was given and has not yet reported idle for. */
  job: Job | null;
}

/**
 * A pool of engine worker threads sharing jobs chunk by chunk. Each job's chunks are claimed
 * through a shared counter (protocol.ts): every thread on the job — the workers, and the
 * calling thread if it helps — takes the next unclaimed chunk as soon as it finishes one, so
 * uneven chunks and a busy core balance themselves without a message round trip. Replicates
 * are written in place into shared arrays by chunk index, so the response does not depend on
 * which thread drew what. Jobs are served in arrival order. Idle workers are unref'd (a CLI
 * exits when done); a cancelled job's running workers are terminated and replaced lazily.
 */
export class EnginePool {
  private slots: Slot[] = [];
  private jobs = new Map<number, Job>();
  private nextId = 1;

  constructor(
    private readonly file: string,
    readonly size: number = Math.max(1, Math.min(availableParallelism(), 8)),
  ) {}

  /** Draws every chunk of a request; resolves with the replicates (length B, in order). */
  run(request: EngineRequest, chunkSizes: number[], withInnerSe: boolean, opts: RunOptions = {}): Promise<Drawn> {
    return new Promise((resolve, reject) => {
      const id = this.nextId++;
      const B = chunkSizes.reduce((a, b) => a + b, 0);
      const buffers: JobBuffers = {
        control: new SharedArrayBuffer(2 * Int32Array.BYTES_PER_ELEMENT),
        theta: new SharedArrayBuffer(B * Float64Array.BYTES_PER_ELEMENT),
        innerSe: withInnerSe ? new SharedArrayBuffer(B * Float64Array.BYTES_PER_ELEMENT) : null,
        chunks: chunkSizes.length,
      };
      const job: Job = {
        id,
        request,
        buffers,
        control: new Int32Array(buffers.control),
        theta: new Float64Array(buffers.theta),
        innerSe: buffers.innerSe ? new Float64Array(buffers.innerSe) : null,
        chunkSizes,
        total: B,
        finished: 0,
        replicatesDone: 0,
        onProgress: opts.onProgress,
        resolve,
        reject,
        done: false,
      };
      const signal = opts.signal;
      if (signal) {
        if (signal.aborted) return reject(signal.reason ?? new DOMException('The computation was aborted.', 'AbortError'));
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
      this.jobs.set(id, job);
      if (chunkSizes.length === 0) return this.complete(job);
      this.ensureSlots();
      this.dispatch();
      if (opts.inline) void this.drawOnCaller(job, opts.inline, opts.callerDraws ?? 'while-starting');
      else if (opts.inlineLater) {
        void opts.inlineLater.then(
          (inline) => {
            if (inline) void this.drawOnCaller(job, inline, opts.callerDraws ?? 'while-starting');
          },
          () => {},
        );
      }
    });
  }

  /**
   * The calling thread claims and draws chunks of the job itself, yielding between chunks so
   * worker messages are handled. In 'while-starting' mode it stops as soon as a worker is up,
   * so a server's cores are not oversubscribed and its event loop is free again.
   */
  private async drawOnCaller(job: Job, inline: NonNullable<RunOptions['inline']>, mode: 'always' | 'while-starting'): Promise<void> {
    while (!job.done) {
      if (mode === 'while-starting' && this.slots.some((s) => s.isReady)) return;
      const k = Atomics.add(job.control, CLAIMED, 1);
      if (k >= job.buffers.chunks) return;
      try {
        traced(`caller:chunk ${k}`, () => inline(k, job.theta, job.innerSe));
      } catch (e) {
        this.fail(job, e);
        return;
      }
      Atomics.add(job.control, FINISHED, 1);
      this.accept(job, k);
      await new Promise<void>((resolve) => setImmediate(resolve));
    }
  }

  private accept(job: Job, k: number): void {
    if (job.done) return;
    job.finished++;
    job.replicatesDone += job.chunkSizes[k];
    job.onProgress?.(job.replicatesDone, job.total);
    // The atomic read orders this thread's reads of the shared arrays after every worker's
    // writes of the chunks it counted.
    if (job.finished === job.buffers.chunks && Atomics.load(job.control, FINISHED) === job.buffers.chunks) this.complete(job);
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
    // The command line's launcher may have started one already (early-worker.cjs).
    const early = takeEarlyWorker(this.file);
    const worker = early?.worker ?? new Worker(this.file);
    trace(early ? 'pool:adopted-early-worker' : 'pool:started-worker');
    const slot: Slot = { worker, isReady: early?.isReady() ?? false, job: null };
    worker.unref();
    worker.on('message', (msg: FromWorker) => {
      if (msg.type === 'ready') slot.isReady = true;
      else this.onMessage(slot, msg);
    });
    worker.on('error', (err) => this.onCrash(slot, err));
    worker.on('exit', (code) => {
      if (this.slots.includes(slot)) this.onCrash(slot, new Error(`engine worker exited with code ${code}`));
    });
    return slot;
  }

  /** Gives every idle worker the oldest job that still has unclaimed chunks. */
  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.job) continue;
      const job = [...this.jobs.values()].find((j) => !j.done && Atomics.load(j.control, CLAIMED) < j.buffers.chunks);
      if (!job) return;
      slot.job = job;
      slot.worker.ref();
      // Posted at once, even to a worker still starting: its port queues the message, so it
      // starts on the job the moment it is up, without waiting for this thread's event loop
      // (which may be busy drawing a chunk itself).
      const msg: ToWorker = { type: 'run', job: job.id, request: job.request, buffers: job.buffers };
      slot.worker.postMessage(msg);
    }
  }

  private onMessage(slot: Slot, msg: FromWorker): void {
    if (msg.type === 'ready') return;
    const job = this.jobs.get(msg.job);
    if (msg.type === 'idle') {
      if (slot.job?.id === msg.job) slot.job = null;
      slot.worker.unref();
      this.dispatch();
      return;
    }
    if (!job || job.done) return;
    if (msg.type === 'error') {
      const e = msg.error.name === 'EngineError' ? new EngineError(msg.error.code ?? 'internal:engine', msg.error.message, msg.error.path ?? '') : new Error(msg.error.message);
      this.fail(job, e);
    } else this.accept(job, msg.k);
  }

  private complete(job: Job): void {
    job.done = true;
    this.jobs.delete(job.id);
    job.resolve({ theta: job.theta, innerSe: job.innerSe });
  }

  private fail(job: Job, e: unknown): void {
    job.done = true;
    // Nobody claims another chunk of it; workers on it finish their current chunk.
    Atomics.store(job.control, CLAIMED, job.buffers.chunks);
    this.jobs.delete(job.id);
    job.reject(e);
  }

  private cancel(job: Job, reason: unknown): void {
    if (job.done) return;
    // Workers in the middle of this job's chunk cannot be interrupted: replace them.
    for (const slot of [...this.slots]) {
      if (slot.job === job && slot.isReady) {
        this.slots = this.slots.filter((s) => s !== slot);
        void slot.worker.terminate();
      }
    }
    this.fail(job, reason ?? new DOMException('The computation was aborted.', 'AbortError'));
    if (this.jobs.size) {
      this.ensureSlots();
      this.dispatch();
    }
  }

  private onCrash(slot: Slot, err: unknown): void {
    if (!this.slots.includes(slot)) return;
    this.slots = this.slots.filter((s) => s !== slot);
    // A chunk it had claimed will never be written: its job cannot finish.
    if (slot.job && !slot.job.done) this.fail(slot.job, err instanceof Error ? err : new Error(String(err)));
    if (this.jobs.size) {
      this.ensureSlots();
      this.dispatch();
    }
  }
}
