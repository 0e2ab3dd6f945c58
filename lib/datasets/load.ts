import 'server-only';
import { chunksOf, datasetsWithLatest, findDataset, findDatasetById, versionById, versionByNumber, versionsOf } from '@/db/queries/datasets';
import type { ColumnMeta, VersionSource } from '@/db/tables/datasets';
import { AppError } from '@/lib/errors';
import { getChunk, putChunk } from './chunk-cache';
import { decodeChunk } from './encode';

export type Cell = number | string | null;

/** What a version is, without its cells. */
export interface VersionInfo {
  id: number;
  datasetId: number;
  labId: number;
  version: number;
  sha256: string;
  name: string;
  rowCount: number;
  /** Rows per stored chunk. */
  chunkRows: number;
  columns: ColumnMeta[];
  source: VersionSource;
  createdAt: Date;
  createdBy: number | null;
  /** Whether a newer version of the dataset exists. */
  superseded: boolean;
}

export interface LoadedVersion extends VersionInfo {
  /** Column name → cells in row order; numbers for number columns, strings for text and date columns, null for missing. */
  data: Record<string, Cell[]>;
}

function info(v: NonNullable<Awaited<ReturnType<typeof versionById>>>): VersionInfo {
  return {
    id: v.id,
    datasetId: v.datasetId,
    labId: v.labId,
    version: v.version,
    sha256: v.sha256,
    name: v.name,
    rowCount: v.rowCount,
    chunkRows: v.chunkRows,
    columns: v.columns,
    source: v.source,
    createdAt: v.createdAt,
    createdBy: v.createdBy,
    superseded: v.version < v.latestVersion,
  };
}

/** A version's metadata by its id, or null. The caller authorizes `dataset:read` on `labId`. */
export async function versionInfo(versionId: number): Promise<VersionInfo | null> {
  const v = await versionById(versionId);
  return v ? info(v) : null;
}

/**
 * A whole version, cells included. Throws not_found:dataset when there is no such version.
 * The caller authorizes `dataset:read` on the returned `labId` before using the data.
 */
export async function loadDatasetVersion(versionId: number): Promise<LoadedVersion> {
  const v = await versionById(versionId);
  if (!v) throw new AppError('not_found:dataset', 'No such dataset version.');
  const data: Record<string, Cell[]> = {};
  const parts: Cell[][][] = v.columns.map(() => []);
  for (const c of await chunksOf(versionId)) parts[c.columnIndex][c.chunkIndex] = decodeChunk(c.encoding, c.payload);
  v.columns.forEach((col, j) => {
    data[col.name] = parts[j].length === 1 ? parts[j][0] : parts[j].flat();
  });
  return { ...info(v), data };
}

/** The newest version of a dataset (metadata only), or null when the dataset does not exist. */
export async function latestVersion(datasetId: number): Promise<VersionInfo | null> {
  const d = await findDatasetById(datasetId);
  if (!d || d.latestVersion === 0) return null;
  const v = await versionByNumber(datasetId, d.latestVersion);
  return v ? versionInfo(v.id) : null;
}

export interface DatasetListItem {
  id: number;
  name: string;
  updatedAt: Date;
  latest: { id: number; version: number; sha256: string; rowCount: number; columns: ColumnMeta[]; createdAt: Date };
}

/** A lab's datasets by name, each with its newest version. The caller authorizes `dataset:read`. */
export async function listDatasets(labId: number): Promise<DatasetListItem[]> {
  const rows = await datasetsWithLatest(labId);
  return rows.map(({ dataset, latest }) => ({
    id: dataset.id,
    name: dataset.name,
    updatedAt: dataset.updatedAt,
    latest: { id: latest.id, version: latest.version, sha256: latest.sha256, rowCount: latest.rowCount, columns: latest.columns, createdAt: latest.createdAt },
  }));
}

/** A dataset of the lab with its version history (newest first); not_found when it is not the lab's. */
export async function datasetWithVersions(labId: number, datasetId: number) {
  const dataset = await findDataset(labId, datasetId);
  if (!dataset) throw new AppError('not_found:dataset', 'No such dataset in this lab.');
  const versions = await versionsOf(datasetId);
  return { dataset, versions };
}

/** One version of a dataset of the lab, by number; not_found otherwise. */
export async function versionOfDataset(labId: number, datasetId: number, version: number): Promise<VersionInfo> {
  const dataset = await findDataset(labId, datasetId);
  const v = dataset ? await versionByNumber(datasetId, version) : undefined;
  if (!dataset || !v) throw new AppError('not_found:dataset', `No version ${version} of this dataset.`);
  return { ...v, labId, name: dataset.name, superseded: v.version < dataset.latestVersion };
}

/**
 * Rows [offset, offset + limit) of a version, as arrays in column order. Reads only the
 * chunks that cover the range, through an in-memory cache of decoded chunks.
 */
export async function readRows(v: Pick<VersionInfo, 'id' | 'rowCount' | 'columns' | 'chunkRows'>, offset: number, limit: number): Promise<Cell[][]> {
  const end = Math.min(v.rowCount, offset + limit);
  if (offset >= end) return [];
  const { chunkRows } = v;
  const from = Math.floor(offset / chunkRows);
  const to = Math.floor((end - 1) / chunkRows);
  const cols: Cell[][][] = v.columns.map(() => []);
  let missing = false;
  for (let j = 0; j < v.columns.length; j++) {
    for (let k = from; k <= to; k++) {
      const hit = getChunk(`${v.id}:${j}:${k}`);
      if (hit) cols[j][k] = hit;
      else missing = true;
    }
  }
  if (missing) {
    for (const c of await chunksOf(v.id, { from, to })) {
      const cells = cols[c.columnIndex][c.chunkIndex] ?? decodeChunk(c.encoding, c.payload);
      cols[c.columnIndex][c.chunkIndex] = cells;
      putChunk(`${v.id}:${c.columnIndex}:${c.chunkIndex}`, cells);
    }
  }
  const rows: Cell[][] = [];
  for (let i = offset; i < end; i++) {
    const k = Math.floor(i / chunkRows);
    const r = i - k * chunkRows;
    rows.push(cols.map((c) => c[k][r]));
  }
  return rows;
}
