import type { ColumnMeta } from '@/db/tables/datasets';
import type { ParsedColumn } from './column-builder';
import { encodeChunks, type EncodedChunk } from './encode';
import { hashTable } from './hash';
import { CHUNK_ROWS } from './limits';
import { columnMeta } from './summary';
import { TimeSlicer } from './time-slicer';

export type PrepareProgress = { phase: 'summarising'; done: number; total: number } | { phase: 'hashing' };

/** A parsed table made ready to store: column summaries, content hash and the stored chunks. */
export interface PreparedTable {
  rowCount: number;
  columns: ColumnMeta[];
  sha256: string;
  chunkRows: number;
  chunks: EncodedChunk[];
}

/**
 * Everything about storing a table that is computation rather than database work — the
 * column summaries, the SHA-256 of the canonical form and the encoded chunks — so that it
 * can run in the datasets worker thread (lib/datasets/worker-entry.ts) for uploads, and
 * inline for small edited tables. No database, no Node-only state beyond node:crypto.
 */
export async function prepareTable(table: { columns: ParsedColumn[]; rowCount: number }, onProgress?: (p: PrepareProgress) => void): Promise<PreparedTable> {
  const slicer = new TimeSlicer();
  const columns: ColumnMeta[] = [];
  for (const [j, col] of table.columns.entries()) {
    onProgress?.({ phase: 'summarising', done: j, total: table.columns.length });
    columns.push(columnMeta(col));
    await slicer.maybeYield();
  }
  onProgress?.({ phase: 'hashing' });
  const sha256 = await hashTable(table.columns, table.rowCount);
  const chunks: EncodedChunk[] = [];
  for (const c of encodeChunks(table.columns, table.rowCount, CHUNK_ROWS)) {
    chunks.push(c);
    await slicer.maybeYield();
  }
  return { rowCount: table.rowCount, columns, sha256, chunkRows: CHUNK_ROWS, chunks };
}
