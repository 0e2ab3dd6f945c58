import { char, datetime, index, int, mysqlEnum, mysqlTable, uniqueIndex } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { users } from './users';

export const TOKEN_PURPOSES = ['verify-email', 'reset-password'] as const;
export type TokenPurpose = (typeof TOKEN_PURPOSES)[number];

/**
 * One-time tokens mailed to a user (e-mail verification, password reset). Only the SHA-256
 * of the token is stored, so a database leak does not hand out working links; each token
 * expires and is marked used on first use.
 */
export const authTokens = mysqlTable(
  'auth_tokens',
  {
    id: int('id').autoincrement().primaryKey(),
    userId: int('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    purpose: mysqlEnum('purpose', TOKEN_PURPOSES).notNull(),
    tokenHash: char('token_hash', { length: 64 }).notNull(),
    expiresAt: datetime('expires_at', { mode: 'date', fsp: 3 }).notNull(),
    usedAt: datetime('used_at', { mode: 'date', fsp: 3 }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('auth_tokens_hash_unique').on(t.tokenHash), index('auth_tokens_user_idx').on(t.userId, t.purpose)],
);

export type AuthToken = typeof authTokens.$inferSelect;
