import 'server-only';

/**
 * The computations running in this process, one per (lab, key): blocks that ask for the
 * same key while it computes join the same job instead of starting another. Kept on
 * globalThis so a dev-server reload does not lose track of running work.
 */
export interface Job {
  labId: number;
  key: string;
  controller: AbortController;
  progress: number;
  /** Run rows waiting on this job; a run superseded or cancelled leaves the set. */
  runIds: Set<number>;
  done: Promise<void>;
}

const holder = globalThis as unknown as { __marginJobs?: { byKey: Map<string, Job>; byRun: Map<number, Job>; locks: Map<string, Promise<unknown>> } };
const state = (holder.__marginJobs ??= { byKey: new Map(), byRun: new Map(), locks: new Map() });

export const jobKey = (labId: number, key: string) => `${labId}:${key}`;

export function jobFor(labId: number, key: string): Job | undefined {
  return state.byKey.get(jobKey(labId, key));
}

export function jobOfRun(runId: number): Job | undefined {
  return state.byRun.get(runId);
}

export function addJob(job: Job): void {
  state.byKey.set(jobKey(job.labId, job.key), job);
  for (const id of job.runIds) state.byRun.set(id, job);
}

export function attachRun(job: Job, runId: number): void {
  job.runIds.add(runId);
  state.byRun.set(runId, job);
}

/** Detaches a run; when no run waits on the job any more, the computation is stopped. */
export function detachRun(runId: number): void {
  const job = state.byRun.get(runId);
  if (!job) return;
  state.byRun.delete(runId);
  job.runIds.delete(runId);
  if (job.runIds.size === 0) job.controller.abort();
}

export function removeJob(job: Job): void {
  if (state.byKey.get(jobKey(job.labId, job.key)) === job) state.byKey.delete(jobKey(job.labId, job.key));
  for (const id of job.runIds) if (state.byRun.get(id) === job) state.byRun.delete(id);
}

export function activeJobs(): number {
  return state.byKey.size;
}

/** Runs `fn` after every earlier call with the same name has finished (a per-block mutex). */
export async function withLock<T>(name: string, fn: () => Promise<T>): Promise<T> {
  const prev = state.locks.get(name) ?? Promise.resolve();
  let release!: () => void;
  const mine = new Promise<void>((r) => (release = r));
  const tail = prev.then(() => mine);
  state.locks.set(name, tail);
  await prev.catch(() => {});
  try {
    return await fn();
  } finally {
    release();
    if (state.locks.get(name) === tail) state.locks.delete(name);
  }
}
