import { customType, datetime, index, int, longtext, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { labs } from './labs';
import { users } from './users';

/**
 * JSON kept in a LONGTEXT column. MariaDB's JSON type is itself LONGTEXT, and mysql2 hands
 * it back as a string there, so the parse happens here rather than at every call site.
 */
export const jsonText = <T>(name: string) =>
  customType<{ data: T; driverData: string }>({
    dataType: () => 'longtext',
    toDriver: (value) => JSON.stringify(value),
    fromDriver: (value) => (typeof value === 'string' ? (JSON.parse(value) as T) : (value as T)),
  })(name);

/** A LONGBLOB column holding raw bytes (a Yjs document update). */
export const longBlob = (name: string) =>
  customType<{ data: Buffer; driverData: Buffer }>({
    dataType: () => 'longblob',
  })(name);

/** ProseMirror/TipTap document JSON: `{ type: 'doc', content: [...] }`. */
export interface DocJson {
  type: string;
  attrs?: Record<string, unknown>;
  content?: DocJson[];
  text?: string;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
}

/**
 * A Memo: rich text with live blocks. `doc` is the TipTap JSON the editor saves today;
 * `ydoc` is the same document as one Yjs update (Y.encodeStateAsUpdate of the
 * 'default' XML fragment), written on every save, so the collaboration server can load
 * it with Y.applyUpdate and take over without a data migration. `text` is the plain text
 * for search. `revision` increases on every save so a stale autosave is refused.
 */
export const memos = mysqlTable(
  'memos',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').notNull().references(() => labs.id, { onDelete: 'cascade' }),
    title: varchar('title', { length: 200 }).notNull(),
    doc: jsonText<DocJson>('doc').notNull(),
    text: longtext('text').notNull(),
    ydoc: longBlob('ydoc'),
    revision: int('revision').notNull().default(1),
    createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: int('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    archivedAt: datetime('archived_at', { mode: 'date', fsp: 3 }),
  },
  (t) => [index('memos_lab_updated_idx').on(t.labId, t.updatedAt)],
);

export type Memo = typeof memos.$inferSelect;
export type NewMemo = typeof memos.$inferInsert;
