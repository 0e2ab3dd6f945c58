import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { getDb } from '../client';
import { labs, memberships, users, type Role } from '../schema';

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
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.labId, labId))
    .orderBy(asc(users.name));
}

/** Creates a lab with its creator as Owner, in one transaction. */
export async function createLab(name: string, ownerId: number): Promise<number> {
  return getDb().transaction(async (tx) => {
    const [lab] = await tx.insert(labs).values({ name, createdBy: ownerId }).$returningId();
    await tx.insert(memberships).values({ labId: lab.id, userId: ownerId, role: 'owner' });
    return lab.id;
  });
}

export async function addMember(labId: number, userId: number, role: Role): Promise<void> {
  await getDb().insert(memberships).values({ labId, userId, role });
}
