import 'server-only';
import { serverBlock } from '@/blocks/registry.server';
import type { ComputeDefinition } from '@/blocks/shared/compute';
import { findResult, findResultById, findRun, insertRun, latestRunOfBlock, liveRunsOfBlock, storeResult, updateRuns } from '@/db/queries/runs';
import type { Run } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { ENGINE_VERSION, type EngineResponse } from '@/lib/resampling';
import { parseWith } from '@/lib/validation';
import { loadVersion, resolveVersion, type VersionMeta } from './datasets';
import { computeOnWorkers } from './engine';
import { addJob, attachRun, detachRun, jobFor, jobOfRun, removeJob, withLock, type Job } from './jobs';
import { runKey } from './key';
import type { RunError, RunView } from './types';

export interface RunRequest {
  labId: number;
  memoId: number;
  blockId: string;
  type: string;
  settings: unknown;
  userId: number;
  /** Whether the user's role may start a computation (run:compute); reading cached results needs only memo:read. */
  canCompute: boolean;
  /** How long to wait for a fresh computation before answering with its progress (ms). */
  waitMs?: number;
}

/** The settings a key hashes: the dataset reference is left out, its content hash stands for it. */
function keyedSettings(settings: unknown): unknown {
  if (settings && typeof settings === 'object' && 'dataset' in settings) {
    const { dataset: _dataset, ...rest } = settings as Record<string, unknown>;
    return rest;
  }
  return settings;
}

function computeDefinition(type: string): ComputeDefinition {
  const def = serverBlock(type)?.compute;
  if (!def) throw new AppError('invalid:block', `Blocks of type "${type}" do not compute.`, 'type');
  return def;
}

/** Parses a block's settings and works out its run key (without loading the data). */
export async function planKey(labId: number, type: string, rawSettings: unknown): Promise<{ def: ComputeDefinition; settings: unknown; meta: VersionMeta; key: string }> {
  const def = computeDefinition(type);
  const settings = parseWith(def.settings, rawSettings, 'block');
  const meta = await resolveVersion(labId, def.dataset(settings));
  const key = runKey({ kind: def.kind, dataSha256: meta.sha256, settings: keyedSettings(settings), engineVersion: ENGINE_VERSION });
  return { def, settings, meta, key };
}

/**
 * Asks for a block's result. In order: the block's own newest run when it already has
 * this key (current, or still computing); else a stored result with this key from any
 * block of the lab (cache hit: a new `current` run, no computation); else, when the role
 * may compute, a new `queued` run computed on worker threads. Older runs of the block turn
 * `stale`. Answers at once with a cache hit, or after at most `waitMs` otherwise.
 */
export async function requestRun(req: RunRequest): Promise<RunView> {
  const { def, settings, meta, key } = await planKey(req.labId, req.type, req.settings);
  const { runId, job } = await withLock(`${req.memoId}:${req.blockId}`, async () => {
    const latest = await latestRunOfBlock(req.memoId, req.blockId);
    if (latest && latest.key === key) {
      if (latest.state === 'current') return { runId: latest.id, job: undefined };
      if ((latest.state === 'queued' || latest.state === 'running') && jobOfRun(latest.id)) return { runId: latest.id, job: jobOfRun(latest.id) };
      if (latest.state === 'failed' && !retryable(latest.error)) return { runId: latest.id, job: undefined };
    }
    const base = { labId: req.labId, memoId: req.memoId, blockId: req.blockId, kind: def.kind, key, datasetVersionId: meta.versionId, settings, engineVersion: ENGINE_VERSION, requestedBy: req.userId };
    const cached = await findResult(req.labId, key);
    if (cached) {
      const now = new Date();
      const id = await insertRun({ ...base, state: 'current', progress: 1, resultId: cached.id, startedAt: now, finishedAt: now });
      await supersede(req.memoId, req.blockId, id);
      return { runId: id, job: undefined };
    }
    if (!req.canCompute) {
      throw new AppError('forbidden:run', 'This result has not been computed yet, and your role in this lab does not start computations. It appears once an Author or Owner opens the memo.');
    }
    const id = await insertRun({ ...base, state: 'queued', progress: 0 });
    await supersede(req.memoId, req.blockId, id);
    return { runId: id, job: startOrJoin(req.labId, key, id, meta, def, settings) };
  });
  if (job && (req.waitMs ?? 400) > 0) await Promise.race([job.done, new Promise((r) => setTimeout(r, req.waitMs ?? 400))]);
  return (await getRunView(runId))!;
}

/** Older live runs of the block become stale; their computations stop if nobody else waits on them. */
async function supersede(memoId: number, blockId: string, newId: number) {
  const old = await liveRunsOfBlock(memoId, blockId, newId);
  await updateRuns(
    old.map((r) => r.id),
    { state: 'stale' },
  );
  for (const r of old) detachRun(r.id);
}

function startOrJoin(labId: number, key: string, runId: number, meta: VersionMeta, def: ComputeDefinition, settings: unknown): Job {
  const existing = jobFor(labId, key);
  if (existing && !existing.controller.signal.aborted) {
    attachRun(existing, runId);
    return existing;
  }
  const job: Job = { labId, key, controller: new AbortController(), progress: 0, runIds: new Set([runId]), done: Promise.resolve() };
  addJob(job);
  job.done = execute(job, meta, def, settings);
  return job;
}

async function execute(job: Job, meta: VersionMeta, def: ComputeDefinition, settings: unknown): Promise<void> {
  const t0 = performance.now();
  const signal = job.controller.signal;
  try {
    await updateRuns([...job.runIds], { state: 'running', startedAt: new Date() });
    const version = await loadVersion(meta.versionId);
    const plan = def.plan(settings, version);
    const responses: EngineResponse[] = [];
    for (let i = 0; i < plan.requests.length; i++) {
      if (signal.aborted) throw new DOMException('cancelled', 'AbortError');
      const n = plan.requests.length;
      responses.push(await computeOnWorkers(plan.requests[i], { signal, onProgress: (f) => (job.progress = (i + f) / n) }));
    }
    const result = plan.finish(responses);
    const resultId = await storeResult({ labId: job.labId, key: job.key, kind: def.kind, engineVersion: ENGINE_VERSION, result, computeMs: Math.round(performance.now() - t0) });
    await settle(job, { state: 'current', progress: 1, resultId, finishedAt: new Date() });
  } catch (e) {
    const error = toRunError(e, signal.aborted);
    await settle(job, { state: 'failed', error, finishedAt: new Date() }).catch((err) => {
      removeJob(job);
      console.error('[margin] could not record a failed run', err);
    });
  }
}

/**
 * Writes the final state to every run waiting on the job, including runs that joined while
 * the previous write was in flight, then forgets the job (in the same tick as the last
 * check, so no run can join unseen).
 */
async function settle(job: Job, set: Parameters<typeof updateRuns>[1]) {
  const done = new Set<number>();
  for (;;) {
    const ids = [...job.runIds].filter((id) => !done.has(id));
    if (ids.length === 0) break;
    await updateRuns(ids, set);
    for (const id of ids) done.add(id);
  }
  removeJob(job);
}

export function toRunError(e: unknown, aborted: boolean): RunError {
  if (aborted) return { code: 'cancelled:run', message: 'The run was cancelled.', path: '' };
  if (e instanceof AppError) return { code: e.code, message: e.message, path: e.path };
  if (e && typeof e === 'object' && (e as { name?: string }).name === 'EngineError') {
    const x = e as { code: string; message: string; path?: string };
    return { code: x.code, message: x.message, path: x.path ?? '' };
  }
  console.error('[margin] run failed', e);
  return { code: 'internal:run', message: 'The computation failed on the server. Please try again.', path: '' };
}

/** Failures worth trying again with the same key (bad input fails the same way every time). */
function retryable(error: RunError | null): boolean {
  return !error || /^(cancelled|internal|interrupted|unavailable):/.test(error.code);
}

/** A run with its result; a queued/running run that no job in this process owns (the server restarted) is marked failed. */
export async function getRunView(runId: number): Promise<(RunView & { labId: number; memoId: number }) | undefined> {
  // The job is looked up before the row is read: a job leaves this process only after its
  // final state is written (settle, cancelRun), so "no job" here means the row read below is
  // final or truly orphaned — never a run whose cancel or result is still being written.
  const job = jobOfRun(runId);
  let run = await findRun(runId);
  if (!run) return undefined;
  if ((run.state === 'queued' || run.state === 'running') && !job) {
    const error = { code: 'interrupted:run', message: 'The run was interrupted (the server restarted). It starts again when the block asks.', path: '' };
    await updateRuns([runId], { state: 'failed', error, finishedAt: new Date() });
    run = { ...run, state: 'failed', error };
  }
  return toView(run, job);
}

async function toView(run: Run, job?: Job): Promise<RunView & { labId: number; memoId: number }> {
  const stored = run.resultId ? await findResultById(run.resultId) : undefined;
  return {
    id: run.id,
    labId: run.labId,
    memoId: run.memoId,
    blockId: run.blockId,
    kind: run.kind,
    key: run.key,
    state: run.state,
    progress: job && (run.state === 'queued' || run.state === 'running') ? job.progress : run.progress,
    error: run.error ?? null,
    result: stored?.result ?? null,
    datasetVersionId: run.datasetVersionId,
    computeMs: stored?.computeMs ?? null,
    createdAt: run.createdAt.toISOString(),
    finishedAt: run.finishedAt?.toISOString() ?? null,
  };
}

/** Cancels a queued or running run. Other blocks waiting on the same computation keep it going. */
export async function cancelRun(runId: number): Promise<RunView> {
  const run = await findRun(runId);
  if (!run) throw new AppError('not_found:run', 'No such run.');
  if (run.state === 'queued' || run.state === 'running') {
    // Written before the job lets go of the run, so a reader never sees it running without a job.
    await updateRuns([runId], { state: 'failed', error: { code: 'cancelled:run', message: 'The run was cancelled.', path: '' }, finishedAt: new Date() });
    detachRun(runId);
  }
  return (await getRunView(runId))!;
}

/** The lab a run belongs to (for authorization before anything else is read). */
export async function runLab(runId: number): Promise<{ labId: number; memoId: number } | undefined> {
  const run = await findRun(runId);
  return run ? { labId: run.labId, memoId: run.memoId } : undefined;
}
