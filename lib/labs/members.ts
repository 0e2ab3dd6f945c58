import 'server-only';
import { getDb } from '@/db/client';
import type { Tx } from '@/db/queries/executor';
import { deleteMember, lockMemberships, setMemberRole } from '@/db/queries/labs';
import type { Role } from '@/db/schema';
import { recordAudit } from '../audit';
import { AppError } from '../errors';

const LAST_OWNER = 'A lab needs at least one Owner. Make another member an Owner first.';

/**
 * Locks the lab's memberships, finds the target, and refuses a change that would leave the
 * lab without an Owner. The lock (SELECT … FOR UPDATE) makes two Owners demoting each other
 * at the same moment safe: the second one waits and then sees the first change.
 */
async function lockTarget(tx: Tx, labId: number, userId: number, leavesOwnerRole: boolean) {
  const rows = await lockMemberships(tx, labId);
  const target = rows.find((r) => r.userId === userId);
  if (!target) throw new AppError('not_found:member', 'That person is not a member of this lab.');
  if (leavesOwnerRole && target.role === 'owner' && rows.filter((r) => r.role === 'owner').length <= 1) {
    throw new AppError('conflict:last-owner', LAST_OWNER);
  }
  return target;
}

export async function changeMemberRole(actorId: number, labId: number, userId: number, role: Role): Promise<{ userId: number; role: Role }> {
  await getDb().transaction(async (tx) => {
    const target = await lockTarget(tx, labId, userId, role !== 'owner');
    if (target.role === role) return;
    await setMemberRole(labId, userId, role, tx);
    await recordAudit({ labId, actorId, action: 'member.role-changed', subject: `user:${userId}`, detail: { from: target.role, to: role } }, tx);
  });
  return { userId, role };
}

export async function removeMember(actorId: number, labId: number, userId: number): Promise<void> {
  await getDb().transaction(async (tx) => {
    const target = await lockTarget(tx, labId, userId, true);
    await deleteMember(labId, userId, tx);
    await recordAudit({ labId, actorId, action: actorId === userId ? 'member.left' : 'member.removed', subject: `user:${userId}`, detail: { role: target.role } }, tx);
  });
}

/** A member leaves a lab on their own; the last Owner cannot. */
export async function leaveLab(userId: number, labId: number): Promise<void> {
  await removeMember(userId, labId, userId);
}
