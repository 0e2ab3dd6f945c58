import 'server-only';
import { insertVersion, type VersionTarget } from '@/db/queries/datasets';
import type { ColumnMeta, VersionSource } from '@/db/tables/datasets';
import type { ParsedColumn } from './column-builder';
import { encodeChunks } from './encode';
import { hashTable } from './hash';
import { CHUNK_ROWS } from './limits';
import { columnMeta } from './summary';
import { TimeSlicer } from './time-slicer';

export type StoreProgress = { phase: 'summarising'; done: number; total: number } | { phase: 'hashing' } | { phase: 'storing'; done: number; total: number };

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
 */
export async function storeTable(
  target: VersionTarget,
  table: { columns: ParsedColumn[]; rowCount: number },
  source: VersionSource,
  userId: number | null,
  onProgress?: (p: StoreProgress) => void,
): Promise<StoredVersion> {
  const slicer = new TimeSlicer();
  const columns: ColumnMeta[] = [];
  for (const [j, col] of table.columns.entries()) {
    onProgress?.({ phase: 'summarising', done: j, total: table.columns.length });
    columns.push(columnMeta(col));
    await slicer.maybeYield();
  }
  onProgress?.({ phase: 'hashing' });
  const sha256 = await hashTable(table.columns, table.rowCount);
  const perColumn = Math.max(1, Math.ceil(table.rowCount / CHUNK_ROWS));
  const total = perColumn * table.columns.length;
  onProgress?.({ phase: 'storing', done: 0, total });
  let lastReport = 0;
  const stored = await insertVersion(target, { sha256, rowCount: table.rowCount, chunkRows: CHUNK_ROWS, columns, source }, encodeChunks(table.columns, table.rowCount, CHUNK_ROWS), userId, async (done) => {
    if (onProgress && (done === total || performance.now() - lastReport > 100)) {
      lastReport = performance.now();
      onProgress({ phase: 'storing', done, total });
    }
    await slicer.maybeYield();
  });
  return { ...stored, sha256, rowCount: table.rowCount, columns };
}
