import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { getDb } from '../client';
import { users, type NewUser, type User } from '../schema';
import type { Executor } from './executor';

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function findUserByEmail(email: string, db: Executor = getDb()): Promise<User | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, normaliseEmail(email))).limit(1);
  return row;
}

export async function findUserById(id: number): Promise<User | undefined> {
  const [row] = await getDb().select().from(users).where(eq(users.id, id)).limit(1);
  return row;
}

export async function insertUser(user: NewUser, db: Executor = getDb()): Promise<number> {
  const [res] = await db.insert(users).values({ ...user, email: normaliseEmail(user.email) }).$returningId();
  return res.id;
}

export async function setUserName(id: number, name: string): Promise<void> {
  await getDb().update(users).set({ name }).where(eq(users.id, id));
}

export async function markEmailVerified(id: number, db: Executor = getDb()): Promise<void> {
  await db.update(users).set({ emailVerified: true }).where(eq(users.id, id));
}

/** Sets a new password hash and bumps the session version, which ends every earlier session. */
export async function setPasswordHash(id: number, passwordHash: string, db: Executor = getDb()): Promise<void> {
  await db
    .update(users)
    .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, id));
}
