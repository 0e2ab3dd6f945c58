import { char, customType, datetime, index, int, json, mysqlEnum, mysqlTable, primaryKey, smallint, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { labs } from './labs';
import { users } from './users';

/**
 * Binary column up to 4 GiB. A chunk of one column is at most a few MB (CHUNK_ROWS rows), far
 * below the server's max_allowed_packet (256M), so a 1,000,000-row version is a few hundred
 * small rows rather than one huge value.
 */
const longblob = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => 'longblob',
});

/** A Dataset is a named table in a Lab; its content lives in numbered, immutable versions. */
export const datasets = mysqlTable(
  'datasets',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id')
      .notNull()
      .references(() => labs.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 120 }).notNull(),
    /** Number of the newest version; the next upload takes latestVersion + 1 under a row lock. */
    latestVersion: int('latest_version').notNull().default(0),
    createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('datasets_lab_name_unique').on(t.labId, t.name)],
);

export const COLUMN_TYPES = ['number', 'text', 'date'] as const;
export type ColumnType = (typeof COLUMN_TYPES)[number];

/** Summary of a number column (missing values left out). Quantiles: Hyndman–Fan type 7. */
export interface NumberSummary {
  kind: 'number';
  n: number;
  mean: number;
  sd: number | null;
  min: number;
  q1: number;
  median: number;
  q3: number;
  max: number;
}
/** Summary of a text column: distinct values (capped) and the most frequent ones. */
export interface TextSummary {
  kind: 'text';
  n: number;
  distinct: number;
  distinctCapped: boolean;
  top: { value: string; count: number }[];
  /** Set when most values are numbers: which line first held something else, so users can fix it. */
  mostlyNumbers?: { numbers: number; others: number; firstLine: number; example: string };
}
/** Summary of a date column (ISO 8601 strings, compared as text). */
export interface DateSummary {
  kind: 'date';
  n: number;
  min: string;
  max: string;
  distinct: number;
  distinctCapped: boolean;
}
export type ColumnSummary = NumberSummary | TextSummary | DateSummary | { kind: 'empty'; n: 0 };

export interface ColumnMeta {
  name: string;
  type: ColumnType;
  missing: number;
  summary: ColumnSummary;
}

/** How a version came to be: the options used to read it, so the reading can be reproduced. */
export interface VersionSource {
  kind: 'upload' | 'paste' | 'edit' | 'seed';
  fileName?: string;
  bytes?: number;
  delimiter?: string;
  header?: boolean;
  decimal?: '.' | ',';
}

/**
 * One version of a dataset, never updated after insert. `sha256` is the SHA-256 of the
 * canonical form of the parsed table (lib/datasets/hash.ts), so equal tables have equal hashes
 * whatever delimiter or quoting the file used.
 */
export const datasetVersions = mysqlTable(
  'dataset_versions',
  {
    id: int('id').autoincrement().primaryKey(),
    datasetId: int('dataset_id')
      .notNull()
      .references(() => datasets.id, { onDelete: 'cascade' }),
    version: int('version').notNull(),
    sha256: char('sha256', { length: 64 }).notNull(),
    rowCount: int('row_count').notNull(),
    columnCount: smallint('column_count').notNull(),
    /** Rows per stored chunk; chunk k of a column holds rows [k·chunkRows, (k+1)·chunkRows). */
    chunkRows: int('chunk_rows').notNull(),
    columns: json('columns').$type<ColumnMeta[]>().notNull(),
    source: json('source').$type<VersionSource>().notNull(),
    createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('dataset_versions_dataset_version_unique').on(t.datasetId, t.version), index('dataset_versions_sha_idx').on(t.sha256)],
);

/**
 * The parsed table, column by column in chunks of `chunkRows` rows. Encodings:
 * `f64` — little-endian IEEE-754 doubles, NaN for a missing value (number columns);
 * `json` — a UTF-8 JSON array of strings and nulls (text and date columns).
 */
export const datasetChunks = mysqlTable(
  'dataset_chunks',
  {
    versionId: int('version_id')
      .notNull()
      .references(() => datasetVersions.id, { onDelete: 'cascade' }),
    columnIndex: smallint('column_index').notNull(),
    chunkIndex: int('chunk_index').notNull(),
    encoding: mysqlEnum('encoding', ['f64', 'json']).notNull(),
    payload: longblob('payload').notNull(),
  },
  (t) => [primaryKey({ columns: [t.versionId, t.columnIndex, t.chunkIndex] })],
);

export type Dataset = typeof datasets.$inferSelect;
export type DatasetVersion = typeof datasetVersions.$inferSelect;
