import 'server-only';
import { findDataset, findDatasetByName, nameTaken } from '@/db/queries/datasets';
import { AppError } from '@/lib/errors';
import type { ReadOptions } from './options';
import { readCsvInWorker, type ReadProgress } from './read-in-worker';
import { storePrepared, type StoredVersion, type StoreProgress } from './store';

export type ImportProgress = ReadProgress | StoreProgress;

export interface ImportCsvInput {
  labId: number;
  userId: number;
  /** Upload a new version of this dataset … */
  datasetId?: number;
  /** … or create a dataset with this name (version 1). */
  name?: string;
  body: AsyncIterable<Uint8Array>;
  options?: Partial<ReadOptions>;
  source: { kind: 'upload' | 'paste' | 'seed'; fileName?: string };
  /** The Content-Length the client announced; fewer bytes arriving means a cut-off upload. */
  declaredBytes?: number;
  onProgress?: (p: ImportProgress) => void;
  /** Aborted when the uploader cancels or goes away: the import stops and stores nothing. */
  signal?: AbortSignal;
}

export interface ImportResult extends StoredVersion {
  options: ReadOptions;
  bytes: number;
}

/**
 * Reads a CSV upload and stores it as a new version — version 1 of a new dataset, or the
 * next version of an existing one. The file is read, typed, summarised and hashed in a worker
 * thread (read-in-worker.ts), completely, before anything is written; the write is one
 * transaction, so a bad file, a cancel or a failure part-way stores nothing. The caller has
 * authorized `dataset:write` on `labId`.
 */
export async function importCsv(input: ImportCsvInput): Promise<ImportResult> {
  if (input.datasetId === undefined) {
    if (!input.name) throw new AppError('invalid:dataset', 'Give the new dataset a name.', 'name');
    // Checked again by the unique index inside the transaction; this only fails fast, before a long upload.
    if (await findDatasetByName(input.labId, input.name)) throw nameTaken(input.name);
  } else if (!(await findDataset(input.labId, input.datasetId))) {
    throw new AppError('not_found:dataset', 'No such dataset in this lab.');
  }
  const table = await readCsvInWorker(input.body, input.options, { onProgress: input.onProgress, signal: input.signal });
  if (input.declaredBytes !== undefined && table.bytes !== input.declaredBytes) {
    throw new AppError('bad_request:dataset', `The upload was cut short: ${table.bytes} of ${input.declaredBytes} bytes arrived. Nothing was stored; please try again.`, 'file');
  }
  const target = input.datasetId !== undefined ? { datasetId: input.datasetId } : { newDataset: { labId: input.labId, name: input.name! } };
  const stored = await storePrepared(
    target,
    table,
    { kind: input.source.kind, ...(input.source.fileName ? { fileName: input.source.fileName } : {}), bytes: table.bytes, ...table.options },
    input.userId,
    { onProgress: input.onProgress, signal: input.signal },
  );
  return { ...stored, options: table.options, bytes: table.bytes };
}
