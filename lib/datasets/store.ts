import 'server-only';
import { insertVersion, type VersionTarget } from '@/db/queries/datasets';
import type { ColumnMeta, VersionSource } from '@/db/tables/datasets';
import type { ParsedColumn } from './column-builder';
import { prepareTable, type PreparedTable, type PrepareProgress } from './prepare';
import { TimeSlicer } from './time-slicer';

export type StoreProgress = PrepareProgress | { phase: 'storing'; done: number; total: number };

export interface StoredVersion {
  datasetId: number;
  versionId: number;
  version: number;
  sha256: string;
  rowCount: number;
  columns: ColumnMeta[];
}

/**
 * Summarises, hashes and stores a parsed table as the next version of a dataset (or as
 * version 1 of a new one), in one transaction: a failure at any point stores nothing.
 * Uploads do the summarising and hashing in the datasets worker and call `storePrepared`.
 */
export async function storeTable(
  target: VersionTarget,
  table: { columns: ParsedColumn[]; rowCount: number },
  source: VersionSource,
  userId: number | null,
  onProgress?: (p: StoreProgress) => void,
): Promise<StoredVersion> {
  return storePrepared(target, await prepareTable(table, onProgress), source, userId, { onProgress });
}

/**
 * Writes a prepared table in one transaction. `signal`: an abort before the commit (the
 * uploader went away, or pressed Cancel) rolls everything back, so nothing is stored.
 */
export async function storePrepared(
  target: VersionTarget,
  prepared: PreparedTable,
  source: VersionSource,
  userId: number | null,
  opts: { onProgress?: (p: StoreProgress) => void; signal?: AbortSignal } = {},
): Promise<StoredVersion> {
  const { onProgress, signal } = opts;
  const slicer = new TimeSlicer();
  const total = prepared.chunks.length;
  onProgress?.({ phase: 'storing', done: 0, total });
  let lastReport = 0;
  signal?.throwIfAborted();
  const stored = await insertVersion(
    target,
    { sha256: prepared.sha256, rowCount: prepared.rowCount, chunkRows: prepared.chunkRows, columns: prepared.columns, source },
    prepared.chunks,
    userId,
    async (done) => {
      // Checked after every chunk, and so once more after the last one, just before the commit.
      signal?.throwIfAborted();
      if (onProgress && (done === total || performance.now() - lastReport > 100)) {
        lastReport = performance.now();
        onProgress({ phase: 'storing', done, total });
      }
      await slicer.maybeYield();
    },
  );
  return { ...stored, sha256: prepared.sha256, rowCount: prepared.rowCount, columns: prepared.columns };
}
