import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '../client';
import { users, type NewUser, type User } from '../schema';

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function findUserByEmail(email: string): Promise<User | undefined> {
  const [row] = await getDb().select().from(users).where(eq(users.email, normaliseEmail(email))).limit(1);
  return row;
}

export async function findUserById(id: number): Promise<User | undefined> {
  const [row] = await getDb().select().from(users).where(eq(users.id, id)).limit(1);
  return row;
}

export async function insertUser(user: NewUser): Promise<number> {
  const [res] = await getDb().insert(users).values({ ...user, email: normaliseEmail(user.email) }).$returningId();
  return res.id;
}
