// What the runs integration tests compute in: a user owning a lab, one dataset and one memo,
// on the test file's own database and the real worker pool.
import { afterAll } from 'vitest';
import type { EditedCell } from '@/lib/datasets/from-rows';

type Svc = typeof import('@/lib/runs/service');

export interface RunLab {
  svc: Svc;
  userId: number;
  labId: number;
  datasetId: number;
  memoId: number;
}

/**
 * Stores the user, lab, dataset (version 1, as seed data) and memo. Call it in `beforeAll`,
 * after `useTestDatabase()`: the modules are imported here, not at the top, so that the
 * database client is first loaded once DATABASE_URL names the file's own database.
 */
export async function seedRunLab(spec: {
  user: { email: string; name: string };
  lab: string;
  dataset: { name: string; columns: string[]; rows: EditedCell[][] };
  memo: string;
}): Promise<RunLab> {
  const svc = await import('@/lib/runs/service');
  const { insertUser } = await import('@/db/queries/users');
  const { createLab } = await import('@/db/queries/labs');
  const { storeTable } = await import('@/lib/datasets/store');
  const { tableFromRows } = await import('@/lib/datasets');
  const { createMemo } = await import('@/lib/memos');
  const userId = await insertUser({ ...spec.user, passwordHash: 'x' });
  const labId = await createLab(spec.lab, userId);
  const stored = await storeTable({ newDataset: { labId, name: spec.dataset.name } }, tableFromRows(spec.dataset.columns, spec.dataset.rows), { kind: 'seed' }, userId);
  const memoId = await createMemo(labId, userId, spec.memo);
  return { svc, userId, labId, datasetId: stored.datasetId, memoId };
}

/** Stops the worker threads once the file's tests are done, so no run they started (a cancelled or superseded long one) still computes after them. */
export function closeComputePoolAfterAll(): void {
  afterAll(async () => {
    const { closeComputePool } = await import('@/lib/compute');
    await closeComputePool();
  });
}

/**
 * Estimate-block settings for the median of the `nitrate` column of the latest version;
 * `patch` replaces whole fields (a pinned `dataset`, another `level`, ...).
 */
export function medianSettings(datasetId: number, run: { B: number; seed: string; methods: string[] }, patch: Record<string, unknown> = {}) {
  return {
    dataset: { datasetId, versionId: null },
    filter: null,
    statistic: { name: 'median', column: 'nitrate' },
    scheme: { name: 'ordinary' },
    B: run.B,
    seed: run.seed,
    level: 0.95,
    methods: run.methods,
    ...patch,
  };
}
