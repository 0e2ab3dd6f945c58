import 'server-only';
import { and, desc, eq, inArray, ne } from 'drizzle-orm';
import { getDb } from '../client';
import { runResults, runs, type Run, type RunResultRow, type RunState } from '../schema';

export type NewRun = typeof runs.$inferInsert;

export async function insertRun(row: NewRun): Promise<number> {
  const [r] = await getDb().insert(runs).values(row).$returningId();
  return r.id;
}

export async function findRun(id: number): Promise<Run | undefined> {
  const [r] = await getDb().select().from(runs).where(eq(runs.id, id)).limit(1);
  return r;
}

/** The newest run of one block: what the block shows. */
export async function latestRunOfBlock(memoId: number, blockId: string): Promise<Run | undefined> {
  const [r] = await getDb().select().from(runs).where(and(eq(runs.memoId, memoId), eq(runs.blockId, blockId))).orderBy(desc(runs.id)).limit(1);
  return r;
}

/** Rows of one block other than `exceptId` that are still live (current, queued or running). */
export async function liveRunsOfBlock(memoId: number, blockId: string, exceptId: number): Promise<Run[]> {
  return getDb()
    .select()
    .from(runs)
    .where(and(eq(runs.memoId, memoId), eq(runs.blockId, blockId), ne(runs.id, exceptId), inArray(runs.state, ['current', 'queued', 'running'])));
}

export async function updateRuns(ids: number[], set: Partial<Pick<Run, 'state' | 'progress' | 'error' | 'resultId' | 'startedAt' | 'finishedAt'>>): Promise<void> {
  if (ids.length === 0) return;
  await getDb().update(runs).set(set).where(inArray(runs.id, ids));
}

export async function findResult(labId: number, key: string): Promise<RunResultRow | undefined> {
  const [r] = await getDb().select().from(runResults).where(and(eq(runResults.labId, labId), eq(runResults.key, key))).limit(1);
  return r;
}

export async function findResultById(id: number): Promise<RunResultRow | undefined> {
  const [r] = await getDb().select().from(runResults).where(eq(runResults.id, id)).limit(1);
  return r;
}

/** Stores a result once per (lab, key); a concurrent duplicate returns the stored row's id. */
export async function storeResult(row: typeof runResults.$inferInsert): Promise<number> {
  await getDb()
    .insert(runResults)
    .values(row)
    .onDuplicateKeyUpdate({ set: { key: row.key } });
  const found = await findResult(row.labId, row.key);
  return found!.id;
}

export async function runsInState(states: RunState[]): Promise<Run[]> {
  return getDb().select().from(runs).where(inArray(runs.state, states));
}

