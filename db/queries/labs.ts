import 'server-only';
import { and, asc, count, eq } from 'drizzle-orm';
import { getDb } from '../client';
import { labs, memberships, users, type Role } from '../schema';
import type { Executor, Tx } from './executor';

export async function labsForUser(userId: number) {
  return getDb()
    .select({ id: labs.id, name: labs.name, role: memberships.role })
    .from(memberships)
    .innerJoin(labs, eq(labs.id, memberships.labId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(labs.name));
}

export async function membershipOf(userId: number, labId: number) {
  const [row] = await getDb()
    .select({ labId: memberships.labId, userId: memberships.userId, role: memberships.role, labName: labs.name })
    .from(memberships)
    .innerJoin(labs, eq(labs.id, memberships.labId))
    .where(and(eq(memberships.userId, userId), eq(memberships.labId, labId)))
    .limit(1);
  return row;
}

export async function membersOf(labId: number) {
  return getDb()
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, since: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.labId, labId))
    .orderBy(asc(users.name));
}

export async function isMember(labId: number, userId: number, db: Executor = getDb()): Promise<boolean> {
  const [row] = await db.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.labId, labId), eq(memberships.userId, userId))).limit(1);
  return !!row;
}

export async function findLab(labId: number) {
  const [row] = await getDb().select().from(labs).where(eq(labs.id, labId)).limit(1);
  return row;
}

/** Creates a lab with its creator as Owner, in one transaction (the caller's, when given). */
export async function createLab(name: string, ownerId: number, tx?: Tx): Promise<number> {
  const run = async (t: Executor) => {
    const [lab] = await t.insert(labs).values({ name, createdBy: ownerId }).$returningId();
    await t.insert(memberships).values({ labId: lab.id, userId: ownerId, role: 'owner' });
    return lab.id;
  };
  return tx ? run(tx) : getDb().transaction(run);
}

export async function renameLab(labId: number, name: string, db: Executor = getDb()): Promise<void> {
  await db.update(labs).set({ name }).where(eq(labs.id, labId));
}

export async function addMember(labId: number, userId: number, role: Role, db: Executor = getDb()): Promise<void> {
  await db.insert(memberships).values({ labId, userId, role });
}

/**
 * Locks the lab's membership rows (SELECT … FOR UPDATE) and returns them, so that a role
 * change or removal can check "is this the last Owner?" without a concurrent change slipping in.
 */
export async function lockMemberships(tx: Tx, labId: number) {
  return tx.select({ userId: memberships.userId, role: memberships.role }).from(memberships).where(eq(memberships.labId, labId)).for('update');
}

export async function setMemberRole(labId: number, userId: number, role: Role, db: Executor = getDb()): Promise<void> {
  await db.update(memberships).set({ role }).where(and(eq(memberships.labId, labId), eq(memberships.userId, userId)));
}

export async function deleteMember(labId: number, userId: number, db: Executor = getDb()): Promise<void> {
  await db.delete(memberships).where(and(eq(memberships.labId, labId), eq(memberships.userId, userId)));
}

export async function ownerCount(labId: number): Promise<number> {
  const [r] = await getDb().select({ n: count() }).from(memberships).where(and(eq(memberships.labId, labId), eq(memberships.role, 'owner')));
  return r?.n ?? 0;
}
