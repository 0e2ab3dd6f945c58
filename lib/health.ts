import 'server-only';
import { sql } from 'drizzle-orm';
import { getDb } from '@/db/client';

export interface Health {
  status: 'ok' | 'degraded';
  database: { status: 'up' | 'down'; latencyMs?: number; message?: string };
}

/** Asks the database a trivial question, giving up after two seconds. */
export async function checkHealth(): Promise<Health> {
  const started = performance.now();
  try {
    await Promise.race([
      getDb().execute(sql`SELECT 1`),
      new Promise((_, reject) => setTimeout(() => reject(new Error('database did not answer within 2 s')), 2000)),
    ]);
    return { status: 'ok', database: { status: 'up', latencyMs: Math.round(performance.now() - started) } };
  } catch (e) {
    const code = (e as { code?: string }).code;
    return { status: 'degraded', database: { status: 'down', message: code ? `database unreachable (${code})` : 'database unreachable' } };
  }
}
