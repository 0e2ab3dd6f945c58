import { datetime, index, int, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';

/**
 * Rate-limit log: one row per counted attempt, keyed by a bucket such as
 * `sign-in:account:a@b.org` or `reset:address:203.0.113.7`. A sliding window counts the rows
 * of a bucket newer than the window; rows older than a day are pruned. Kept in MariaDB (not
 * process memory) so limits hold across restarts and across several app processes.
 */
export const rateLimitHits = mysqlTable(
  'rate_limit_hits',
  {
    id: int('id').autoincrement().primaryKey(),
    bucket: varchar('bucket', { length: 300 }).notNull(),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('rate_limit_hits_bucket_idx').on(t.bucket, t.createdAt), index('rate_limit_hits_created_idx').on(t.createdAt)],
);
