import 'server-only';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import { getDb } from '../client';
import { invitations, labs, users, type Role } from '../schema';
import type { Executor, Tx } from './executor';

export async function insertInvitation(
  row: { labId: number; email: string; role: Role; tokenHash: string; invitedBy: number; expiresAt: Date },
  db: Executor = getDb(),
): Promise<number> {
  const [r] = await db.insert(invitations).values(row).$returningId();
  return r.id;
}

/** Pending = not accepted, not revoked, not expired. */
export async function pendingInvitations(labId: number, now: Date) {
  return getDb()
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt, invitedByName: users.name })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.labId, labId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now)))
    .orderBy(desc(invitations.id));
}

export async function findInvitationInLab(labId: number, id: number) {
  const [row] = await getDb().select().from(invitations).where(and(eq(invitations.labId, labId), eq(invitations.id, id))).limit(1);
  return row;
}

export async function findInvitationByHash(tokenHash: string) {
  const [row] = await getDb()
    .select({ invitation: invitations, labName: labs.name, invitedByName: users.name })
    .from(invitations)
    .innerJoin(labs, eq(labs.id, invitations.labId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return row;
}

export async function lockInvitationByHash(tx: Tx, tokenHash: string) {
  const [row] = await tx.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).for('update').limit(1);
  return row;
}

/** Revokes every pending invitation of one address in a lab (before issuing a fresh one). */
export async function revokePendingFor(labId: number, email: string, now: Date, db: Executor = getDb()): Promise<void> {
  await db
    .update(invitations)
    .set({ revokedAt: now })
    .where(and(eq(invitations.labId, labId), eq(invitations.email, email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
}

export async function markInvitationRevoked(id: number, now: Date, db: Executor = getDb()): Promise<void> {
  await db.update(invitations).set({ revokedAt: now }).where(eq(invitations.id, id));
}

export async function markInvitationAccepted(id: number, userId: number, now: Date, db: Executor = getDb()): Promise<void> {
  await db.update(invitations).set({ acceptedAt: now, acceptedBy: userId }).where(eq(invitations.id, id));
}

export async function deleteInvitation(id: number): Promise<void> {
  await getDb().delete(invitations).where(eq(invitations.id, id));
}
