// Runs against the real MariaDB test instance and the real worker-thread engine: results are
// keyed by (data version hash, settings, engine version), reused across blocks, recomputed
// when data or settings change, and states move queued/running → current, current → stale.
import { median } from 'simple-statistics';
import { beforeAll, describe, expect, it } from 'vitest';
import { useTestDatabase } from '../support/database';
import { closeComputePoolAfterAll, medianSettings, seedRunLab } from '../support/runs';

useTestDatabase();

type Svc = typeof import('@/lib/runs/service');
let svc: Svc;
let labId: number;
let otherLabId: number;
let memoId: number;
let datasetId: number;
let userId: number;
let values: number[];

async function until(runId: number, done = (s: string) => s !== 'queued' && s !== 'running') {
  for (let i = 0; i < 600; i++) {
    const v = await svc.getRunView(runId);
    if (v && done(v.state)) return v;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('run did not finish');
}

const settings = (patch: Record<string, unknown> = {}) => medianSettings(datasetId, { B: 1000, seed: 'integration', methods: ['percentile', 'bca'] }, patch);

async function resultCount() {
  const { getPool } = await import('@/db/client');
  const [rows] = await getPool().query('SELECT COUNT(*) AS n FROM run_results');
  return Number((rows as { n: number }[])[0].n);
}

beforeAll(async () => {
  // Invented nitrate readings (mg/L): a skewed sample of 30.
  values = Array.from({ length: 30 }, (_, i) => Number((1.5 + ((i * 7919) % 31) / 10 + (i % 5 === 0 ? 2.5 : 0)).toFixed(2)));
  const rows = values.map((v, i) => [i % 2 ? 'upstream' : 'downstream', v]);
  ({ svc, userId, labId, datasetId, memoId } = await seedRunLab({
    user: { email: 'runs@example.org', name: 'Runner' },
    lab: 'Runs lab',
    dataset: { name: 'Nitrate', columns: ['site', 'nitrate'], rows },
    memo: 'Runs memo',
  }));
  const { createLab } = await import('@/db/queries/labs');
  otherLabId = await createLab('Other lab', userId);
});

closeComputePoolAfterAll();

describe('runs: caching and invalidation', () => {
  let first: Awaited<ReturnType<Svc['requestRun']>>;

  it('computes a new key on the workers and ends current, with the median of the data (simple-statistics)', async () => {
    first = await svc.requestRun({ labId, memoId, blockId: 'a', type: 'estimate', settings: settings(), userId, canCompute: true });
    expect(['queued', 'running', 'current']).toContain(first.state);
    const done = await until(first.id);
    expect(done.state).toBe('current');
    const result = done.result as { response: { estimate: number; B: number; provenance: { engine: string } }; n: number };
    expect(result.response.estimate).toBeCloseTo(median(values), 12);
    expect(result.response.B).toBe(1000);
    expect(result.n).toBe(30);
    expect(done.key).toMatch(/^[0-9a-f]{64}$/);
    expect(await resultCount()).toBe(1);
  });

  it('answers the same block and settings with the same run, without a new row', async () => {
    const again = await svc.requestRun({ labId, memoId, blockId: 'a', type: 'estimate', settings: settings(), userId, canCompute: true });
    expect(again.id).toBe(first.id);
    expect(again.state).toBe('current');
  });

  it('reuses the stored result for another block with equal settings (written in another key order)', async () => {
    const s = settings();
    const reordered = Object.fromEntries(Object.entries(s).reverse());
    const b = await svc.requestRun({ labId, memoId, blockId: 'b', type: 'estimate', settings: reordered, userId, canCompute: false });
    expect(b.state).toBe('current');
    expect(b.id).not.toBe(first.id);
    expect(b.key).toBe(first.key);
    expect(await resultCount()).toBe(1);
    // A Convergence plot of the same settings asks for the very same computation.
    const c = await svc.requestRun({ labId, memoId, blockId: 'c', type: 'convergence-plot', settings: s, userId, canCompute: false });
    expect(c.state).toBe('current');
    expect(c.key).toBe(first.key);
  });

  it('recomputes when a setting changes, and marks the block’s older run stale', async () => {
    const changed = await svc.requestRun({ labId, memoId, blockId: 'a', type: 'estimate', settings: settings({ B: 1200 }), userId, canCompute: true });
    expect(changed.key).not.toBe(first.key);
    expect((await until(changed.id)).state).toBe('current');
    expect((await svc.getRunView(first.id))!.state).toBe('stale');
    expect(await resultCount()).toBe(2);
    // Going back finds the first result in the cache: current again at once, no computation.
    const back = await svc.requestRun({ labId, memoId, blockId: 'a', type: 'estimate', settings: settings(), userId, canCompute: false });
    expect(back.state).toBe('current');
    expect(back.key).toBe(first.key);
    expect(await resultCount()).toBe(2);
  });

  it('recomputes a block following the latest version after the data are edited; a pinned block keeps its key', async () => {
    const { createVersionFromRows } = await import('@/lib/datasets');
    const { latestVersion } = await import('@/lib/datasets');
    const v1 = (await latestVersion(datasetId))!;
    const edited = values.slice();
    edited[0] = 40; // one far outlier, then the median moves
    edited[1] = 41;
    edited[2] = 42;
    await createVersionFromRows(datasetId, ['site', 'nitrate'], edited.map((v, i) => [i % 2 ? 'upstream' : 'downstream', v]), userId);
    const latest = await svc.requestRun({ labId, memoId, blockId: 'a', type: 'estimate', settings: settings(), userId, canCompute: true });
    expect(latest.key).not.toBe(first.key);
    const done = await until(latest.id);
    expect((done.result as { response: { estimate: number } }).response.estimate).toBeCloseTo(median(edited), 12);
    expect(done.datasetVersionId).not.toBe(v1.id);
    const pinned = await svc.requestRun({ labId, memoId, blockId: 'p', type: 'estimate', settings: settings({ dataset: { datasetId, versionId: v1.id } }), userId, canCompute: false });
    expect(pinned.key).toBe(first.key);
    expect(pinned.state).toBe('current');
  });

  it('lets a role without run:compute read cached results only', async () => {
    await expect(svc.requestRun({ labId, memoId, blockId: 'r', type: 'estimate', settings: settings({ seed: 'never computed' }), userId, canCompute: false })).rejects.toMatchObject({ code: 'forbidden:run' });
  });

  it('refuses a dataset of another lab as not found, and bad settings naming the field', async () => {
    await expect(svc.requestRun({ labId: otherLabId, memoId, blockId: 'x', type: 'estimate', settings: settings(), userId, canCompute: true })).rejects.toMatchObject({ code: 'not_found:dataset' });
    await expect(svc.requestRun({ labId, memoId, blockId: 'x', type: 'estimate', settings: settings({ level: 2 }), userId, canCompute: true })).rejects.toMatchObject({ code: 'invalid:block', path: 'level' });
    await expect(svc.requestRun({ labId, memoId, blockId: 'x', type: 'data-table', settings: {}, userId, canCompute: true })).rejects.toMatchObject({ code: 'invalid:block', path: 'type' });
  });

  it('records a run the engine refuses as failed, with the engine’s message (not a crash)', async () => {
    const r = await svc.requestRun({ labId, memoId, blockId: 'f', type: 'estimate', settings: settings({ statistic: { name: 'mean', column: 'site' } }), userId, canCompute: true });
    const done = await until(r.id);
    expect(done.state).toBe('failed');
    expect(done.error).toMatchObject({ code: 'invalid:block', path: 'statistic.column' });
  });

  it('cancels a long run on the worker threads; asking again starts it afresh', async () => {
    const big = settings({ B: 100_000, seed: 'long', methods: ['bca'] });
    const r = await svc.requestRun({ labId, memoId, blockId: 'long', type: 'estimate', settings: big, userId, canCompute: true, waitMs: 50 });
    expect(['queued', 'running']).toContain(r.state);
    const cancelled = await svc.cancelRun(r.id);
    expect(cancelled.state).toBe('failed');
    expect(cancelled.error?.code).toBe('cancelled:run');
    const again = await svc.requestRun({ labId, memoId, blockId: 'long', type: 'estimate', settings: big, userId, canCompute: true, waitMs: 0 });
    expect(again.id).not.toBe(r.id);
    expect((await until(again.id)).state).toBe('current');
  });

  it('moves a superseded computation out of the way: the newer settings win', async () => {
    const slow = await svc.requestRun({ labId, memoId, blockId: 'race', type: 'estimate', settings: settings({ B: 100_000, seed: 'slow' }), userId, canCompute: true, waitMs: 0 });
    const fast = await svc.requestRun({ labId, memoId, blockId: 'race', type: 'estimate', settings: settings({ B: 500, seed: 'fast' }), userId, canCompute: true });
    expect((await until(fast.id)).state).toBe('current');
    expect((await svc.getRunView(slow.id))!.state).toBe('stale');
  });
});
