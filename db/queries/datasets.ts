import 'server-only';
import { and, asc, desc, eq, gte, lte } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/mysql2';
import type { PoolConnection, ResultSetHeader, RowDataPacket } from 'mysql2/promise';
import { AppError } from '@/lib/errors';
import { getDb, getPool } from '../client';
import * as schema from '../schema';
import { datasetChunks, datasets, datasetVersions, users, type ColumnMeta, type VersionSource } from '../schema';

export interface ChunkToStore {
  columnIndex: number;
  chunkIndex: number;
  encoding: 'f64' | 'json';
  payload: Buffer;
}

export interface VersionToStore {
  sha256: string;
  rowCount: number;
  chunkRows: number;
  columns: ColumnMeta[];
  source: VersionSource;
}

/** Where a new version goes: a new dataset (created in the same transaction) or an existing one. */
export type VersionTarget = { newDataset: { labId: number; name: string } } | { datasetId: number };

export interface StoredVersionRow {
  datasetId: number;
  versionId: number;
  version: number;
}

function isDuplicate(e: unknown): boolean {
  return !!e && typeof e === 'object' && (e as { errno?: number }).errno === 1062;
}

/**
 * Stores one version, all or nothing: in one transaction it creates the dataset if asked,
 * takes the next version number under a row lock on the dataset (so two uploads at once get
 * 1 and 2, never the same number), inserts the version row and every chunk, and moves the
 * dataset's latest_version. Any failure rolls all of it back.
 *
 * Chunks go through mysql2's prepared statements (binary protocol), so a payload travels as
 * its bytes rather than as hex text twice its size.
 */
export async function insertVersion(
  target: VersionTarget,
  version: VersionToStore,
  chunks: Iterable<ChunkToStore>,
  userId: number | null,
  onChunk?: (done: number) => void | Promise<void>,
): Promise<StoredVersionRow> {
  const conn: PoolConnection = await getPool().getConnection();
  const db = drizzle(conn, { schema, mode: 'default' });
  try {
    await conn.beginTransaction();
    let datasetId: number;
    if ('newDataset' in target) {
      try {
        const [row] = await db.insert(datasets).values({ labId: target.newDataset.labId, name: target.newDataset.name, createdBy: userId }).$returningId();
        datasetId = row.id;
      } catch (e) {
        if (isDuplicate(e) || isDuplicate((e as { cause?: unknown }).cause)) throw nameTaken(target.newDataset.name);
        throw e;
      }
    } else datasetId = target.datasetId;

    const [locked] = await conn.execute<RowDataPacket[]>('SELECT latest_version FROM datasets WHERE id = ? FOR UPDATE', [datasetId]);
    if (locked.length === 0) throw new AppError('not_found:dataset', 'No such dataset.');
    const next = Number(locked[0].latest_version) + 1;

    const [inserted] = await conn.execute<ResultSetHeader>(
      'INSERT INTO dataset_versions (dataset_id, version, sha256, row_count, column_count, chunk_rows, columns, source, created_by) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)',
      [datasetId, next, version.sha256, version.rowCount, version.columns.length, version.chunkRows, JSON.stringify(version.columns), JSON.stringify(version.source), userId],
    );
    const versionId = inserted.insertId;
    let done = 0;
    for (const c of chunks) {
      await conn.execute('INSERT INTO dataset_chunks (version_id, column_index, chunk_index, encoding, payload) VALUES (?, ?, ?, ?, ?)', [versionId, c.columnIndex, c.chunkIndex, c.encoding, c.payload]);
      await onChunk?.(++done);
    }
    await conn.execute('UPDATE datasets SET latest_version = ?, updated_at = CURRENT_TIMESTAMP(3) WHERE id = ?', [next, datasetId]);
    await conn.commit();
    return { datasetId, versionId, version: next };
  } catch (e) {
    await conn.rollback().catch(() => {});
    throw e;
  } finally {
    conn.release();
  }
}

export function nameTaken(name: string): AppError {
  return new AppError('conflict:dataset', `A dataset named "${name}" already exists in this lab: pick another name, or upload a new version of that one.`, 'name');
}

export async function findDatasetByName(labId: number, name: string) {
  const [row] = await getDb().select().from(datasets).where(and(eq(datasets.labId, labId), eq(datasets.name, name))).limit(1);
  return row;
}

export async function findDataset(labId: number, datasetId: number) {
  const [row] = await getDb().select().from(datasets).where(and(eq(datasets.labId, labId), eq(datasets.id, datasetId))).limit(1);
  return row;
}

export async function findDatasetById(datasetId: number) {
  const [row] = await getDb().select().from(datasets).where(eq(datasets.id, datasetId)).limit(1);
  return row;
}

const versionColumns = {
  id: datasetVersions.id,
  datasetId: datasetVersions.datasetId,
  version: datasetVersions.version,
  sha256: datasetVersions.sha256,
  rowCount: datasetVersions.rowCount,
  columnCount: datasetVersions.columnCount,
  chunkRows: datasetVersions.chunkRows,
  columns: datasetVersions.columns,
  source: datasetVersions.source,
  createdBy: datasetVersions.createdBy,
  createdAt: datasetVersions.createdAt,
};

/** A lab's datasets, with their newest version's metadata, by name. */
export async function datasetsWithLatest(labId: number) {
  return getDb()
    .select({ dataset: datasets, latest: versionColumns })
    .from(datasets)
    .innerJoin(datasetVersions, and(eq(datasetVersions.datasetId, datasets.id), eq(datasetVersions.version, datasets.latestVersion)))
    .where(eq(datasets.labId, labId))
    .orderBy(asc(datasets.name));
}

/** Every version of a dataset, newest first, with the name of who made it. */
export async function versionsOf(datasetId: number) {
  return getDb()
    .select({ ...versionColumns, createdByName: users.name })
    .from(datasetVersions)
    .leftJoin(users, eq(users.id, datasetVersions.createdBy))
    .where(eq(datasetVersions.datasetId, datasetId))
    .orderBy(desc(datasetVersions.version));
}

export async function versionByNumber(datasetId: number, version: number) {
  const [row] = await getDb()
    .select(versionColumns)
    .from(datasetVersions)
    .where(and(eq(datasetVersions.datasetId, datasetId), eq(datasetVersions.version, version)))
    .limit(1);
  return row;
}

/** A version with its dataset's lab and name. */
export async function versionById(versionId: number) {
  const [row] = await getDb()
    .select({ ...versionColumns, labId: datasets.labId, name: datasets.name, latestVersion: datasets.latestVersion })
    .from(datasetVersions)
    .innerJoin(datasets, eq(datasets.id, datasetVersions.datasetId))
    .where(eq(datasetVersions.id, versionId))
    .limit(1);
  return row;
}

/** Stored chunks of a version: all of them, or chunks [from, to] of every column. */
export async function chunksOf(versionId: number, range?: { from: number; to: number }) {
  const where = range
    ? and(eq(datasetChunks.versionId, versionId), gte(datasetChunks.chunkIndex, range.from), lte(datasetChunks.chunkIndex, range.to))
    : eq(datasetChunks.versionId, versionId);
  return getDb()
    .select({ columnIndex: datasetChunks.columnIndex, chunkIndex: datasetChunks.chunkIndex, encoding: datasetChunks.encoding, payload: datasetChunks.payload })
    .from(datasetChunks)
    .where(where)
    .orderBy(asc(datasetChunks.columnIndex), asc(datasetChunks.chunkIndex));
}

/** Renames a dataset; a name already used in the lab is a conflict. */
export async function renameDataset(datasetId: number, name: string): Promise<void> {
  try {
    await getDb().update(datasets).set({ name }).where(eq(datasets.id, datasetId));
  } catch (e) {
    if (isDuplicate(e) || isDuplicate((e as { cause?: unknown }).cause)) throw nameTaken(name);
    throw e;
  }
}
