import { char, datetime, index, int, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { labs, ROLES } from './labs';
import { users } from './users';

/**
 * An Owner's invitation of an e-mail address into a Lab with one role. The link carries a
 * random token; only its SHA-256 is stored. An invitation is pending until it is accepted
 * (by an account with exactly that address), revoked, or past `expiresAt`.
 */
export const invitations = mysqlTable(
  'invitations',
  {
    id: int('id').autoincrement().primaryKey(),
    labId: int('lab_id').notNull().references(() => labs.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    role: mysqlEnum('role', ROLES).notNull(),
    tokenHash: char('token_hash', { length: 64 }).notNull(),
    invitedBy: int('invited_by').references(() => users.id, { onDelete: 'set null' }),
    expiresAt: datetime('expires_at', { mode: 'date', fsp: 3 }).notNull(),
    acceptedAt: datetime('accepted_at', { mode: 'date', fsp: 3 }),
    acceptedBy: int('accepted_by').references(() => users.id, { onDelete: 'set null' }),
    revokedAt: datetime('revoked_at', { mode: 'date', fsp: 3 }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('invitations_hash_unique').on(t.tokenHash), index('invitations_lab_idx').on(t.labId, t.email)],
);

export type Invitation = typeof invitations.$inferSelect;
