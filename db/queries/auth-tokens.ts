import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { getDb } from '../client';
import { authTokens, type TokenPurpose } from '../schema';
import type { Executor, Tx } from './executor';

export async function insertAuthToken(row: { userId: number; purpose: TokenPurpose; tokenHash: string; expiresAt: Date }): Promise<void> {
  await getDb().insert(authTokens).values(row);
}

export type ConsumeResult = { ok: true; userId: number } | { ok: false; reason: 'unknown' | 'expired' | 'used' };

/**
 * Marks a token used, once: the row is locked (SELECT … FOR UPDATE) so two concurrent uses
 * of the same link cannot both succeed. `then` runs inside the same transaction, so its
 * writes and the token's use commit together or not at all.
 */
export async function consumeAuthToken(
  tokenHash: string,
  purpose: TokenPurpose,
  now: Date,
  then: (tx: Tx, userId: number) => Promise<void>,
): Promise<ConsumeResult> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(authTokens)
      .where(and(eq(authTokens.tokenHash, tokenHash), eq(authTokens.purpose, purpose)))
      .for('update')
      .limit(1);
    if (!row) return { ok: false, reason: 'unknown' } as const;
    if (row.usedAt) return { ok: false, reason: 'used' } as const;
    if (row.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: 'expired' } as const;
    await tx.update(authTokens).set({ usedAt: now }).where(eq(authTokens.id, row.id));
    await then(tx, row.userId);
    return { ok: true, userId: row.userId } as const;
  });
}

/** Retires every unused token of a purpose for a user (e.g. the other reset links once one worked). */
export async function retireAuthTokens(userId: number, purpose: TokenPurpose, now: Date, db: Executor = getDb()): Promise<void> {
  await db
    .update(authTokens)
    .set({ usedAt: now })
    .where(and(eq(authTokens.userId, userId), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt)));
}
