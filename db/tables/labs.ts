import { datetime, int, mysqlEnum, mysqlTable, uniqueIndex, varchar, index } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { users } from './users';

/** A Lab is a team space: memos, datasets and members belong to one Lab. */
export const labs = mysqlTable('labs', {
  id: int('id').autoincrement().primaryKey(),
  name: varchar('name', { length: 120 }).notNull(),
  createdBy: int('created_by').references(() => users.id),
  createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

/** The four roles of PRODUCT.md, lowest to highest privilege is reader < reviewer < author < owner. */
export const ROLES = ['owner', 'author', 'reviewer', 'reader'] as const;
export type Role = (typeof ROLES)[number];

/** One membership per (lab, user), with exactly one role. */
export const memberships = mysqlTable(
  'memberships',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').notNull().references(() => labs.id, { onDelete: 'cascade' }),
    userId: int('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    role: mysqlEnum('role', ROLES).notNull(),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('memberships_lab_user_unique').on(t.labId, t.userId), index('memberships_user_idx').on(t.userId)],
);

export type Lab = typeof labs.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
