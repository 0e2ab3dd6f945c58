import { datetime, int, mediumtext, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';

/**
 * Mail captured by the local SMTP fake (scripts/mail-catcher.ts) in development and tests.
 * Never written in production: there the app talks to a real SMTP host instead.
 */
export const devMail = mysqlTable('dev_mail', {
  id: int('id').autoincrement().primaryKey(),
  messageId: varchar('message_id', { length: 300 }),
  fromAddress: varchar('from_address', { length: 300 }).notNull(),
  toAddresses: text('to_addresses').notNull(),
  subject: varchar('subject', { length: 300 }).notNull(),
  text: mediumtext('text'),
  html: mediumtext('html'),
  receivedAt: datetime('received_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

export type DevMail = typeof devMail.$inferSelect;
