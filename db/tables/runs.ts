import { char, datetime, double, index, int, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { labs } from './labs';
import { jsonText, memos } from './memos';
import { users } from './users';

/** The five states of a Run (PRODUCT.md). `stale`: superseded for its block by newer inputs. */
export const RUN_STATES = ['queued', 'running', 'current', 'stale', 'failed'] as const;
export type RunState = (typeof RUN_STATES)[number];

/**
 * The result cache: one row per distinct computation in a lab, keyed by the SHA-256 of
 * (block kind, dataset version hash, normalised settings, engine version). A result never
 * goes out of date for its key, so any block asking for the same key reuses it.
 */
export const runResults = mysqlTable(
  'run_results',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').notNull().references(() => labs.id, { onDelete: 'cascade' }),
    key: char('run_key', { length: 64 }).notNull(),
    kind: varchar('kind', { length: 40 }).notNull(),
    engineVersion: varchar('engine_version', { length: 80 }).notNull(),
    result: jsonText<unknown>('result').notNull(),
    computeMs: int('compute_ms').notNull(),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('run_results_lab_key_unique').on(t.labId, t.key)],
);

/**
 * A Run: one block's request for one key. The newest row of a (memo, block) is what the
 * block shows; older rows of that block turn `stale` when a request with another key
 * arrives. `resultId` is set once the computation (or a cached result) is in.
 */
export const runs = mysqlTable(
  'runs',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').notNull().references(() => labs.id, { onDelete: 'cascade' }),
    memoId: int('memo_id').notNull().references(() => memos.id, { onDelete: 'cascade' }),
    blockId: varchar('block_id', { length: 64 }).notNull(),
    kind: varchar('kind', { length: 40 }).notNull(),
    key: char('run_key', { length: 64 }).notNull(),
    datasetVersionId: int('dataset_version_id'),
    settings: jsonText<unknown>('settings').notNull(),
    engineVersion: varchar('engine_version', { length: 80 }).notNull(),
    state: mysqlEnum('state', RUN_STATES).notNull(),
    progress: double('progress').notNull().default(0),
    error: jsonText<{ code: string; message: string; path: string } | null>('error'),
    resultId: int('result_id').references(() => runResults.id, { onDelete: 'set null' }),
    requestedBy: int('requested_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    startedAt: datetime('started_at', { mode: 'date', fsp: 3 }),
    finishedAt: datetime('finished_at', { mode: 'date', fsp: 3 }),
  },
  (t) => [index('runs_memo_block_idx').on(t.memoId, t.blockId, t.id), index('runs_lab_key_idx').on(t.labId, t.key)],
);

export type Run = typeof runs.$inferSelect;
export type RunResultRow = typeof runResults.$inferSelect;
