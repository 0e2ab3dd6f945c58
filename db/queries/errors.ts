/** True when MariaDB refused a row for breaking a unique key (mysql2 error code ER_DUP_ENTRY, possibly wrapped by drizzle). */
export function isDuplicateKey(e: unknown): boolean {
  const err = e as { code?: string; cause?: { code?: string } } | null;
  return err?.code === 'ER_DUP_ENTRY' || err?.cause?.code === 'ER_DUP_ENTRY';
}
