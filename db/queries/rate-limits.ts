import 'server-only';
import { and, asc, count, eq, gt, lt } from 'drizzle-orm';
import { getDb } from '../client';
import { rateLimitHits } from '../schema';

/** Number of hits in a bucket after `since`, and the oldest of them (to say when the limit lifts). */
export async function hitsSince(bucket: string, since: Date): Promise<{ count: number; oldest: Date | null }> {
  const where = and(eq(rateLimitHits.bucket, bucket), gt(rateLimitHits.createdAt, since));
  const [c] = await getDb().select({ n: count() }).from(rateLimitHits).where(where);
  if (!c || c.n === 0) return { count: 0, oldest: null };
  const [first] = await getDb().select({ at: rateLimitHits.createdAt }).from(rateLimitHits).where(where).orderBy(asc(rateLimitHits.createdAt)).limit(1);
  return { count: c.n, oldest: first?.at ?? null };
}

export async function insertHits(buckets: string[], at: Date): Promise<void> {
  if (buckets.length === 0) return;
  await getDb().insert(rateLimitHits).values(buckets.map((bucket) => ({ bucket, createdAt: at })));
}

export async function clearHits(bucket: string): Promise<void> {
  await getDb().delete(rateLimitHits).where(eq(rateLimitHits.bucket, bucket));
}

export async function pruneHits(before: Date): Promise<void> {
  await getDb().delete(rateLimitHits).where(lt(rateLimitHits.createdAt, before));
}
