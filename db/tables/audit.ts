import { datetime, index, int, json, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { labs } from './labs';
import { users } from './users';

/**
 * The audit trail: who did what, when. `labId` is null for account events (sign-in,
 * password reset). Rows are only ever inserted; a deleted user's events stay, with the
 * actor set to null.
 */
export const auditEvents = mysqlTable(
  'audit_events',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').references(() => labs.id, { onDelete: 'cascade' }),
    actorId: int('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: varchar('action', { length: 64 }).notNull(),
    subject: varchar('subject', { length: 200 }).notNull(),
    detail: json('detail').$type<Record<string, unknown>>(),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('audit_events_lab_idx').on(t.labId, t.createdAt), index('audit_events_actor_idx').on(t.actorId, t.createdAt)],
);

export type AuditEventRow = typeof auditEvents.$inferSelect;
