import { boolean, datetime, int, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';

/**
 * A person who signs in to Margin. E-mail is stored lower-cased; the password only as a hash.
 * `sessionVersion` is copied into each session token at sign-in; changing or resetting the
 * password bumps it, which ends every session issued before (sessions are stateless JWTs).
 */
export const users = mysqlTable(
  'users',
  {
    id: int('id').autoincrement().primaryKey(),
    email: varchar('email', { length: 254 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    passwordHash: varchar('password_hash', { length: 100 }).notNull(),
    emailVerified: boolean('email_verified').notNull().default(false),
    sessionVersion: int('session_version').notNull().default(0),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email)],
);

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
