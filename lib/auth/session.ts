import 'server-only';
import { findUserById } from '@/db/queries/users';
import { AppError } from '../errors';
import { readSessionClaims } from './session-source';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  emailVerified: boolean;
}

/**
 * The signed-in user, or null. The account is read fresh from the database on every call:
 * a deleted account, or a session older than the last password change or reset (its
 * session version is behind), counts as signed out.
 */
export async function currentUser(): Promise<SessionUser | null> {
  const claims = await readSessionClaims();
  if (!claims) return null;
  const user = await findUserById(claims.userId);
  if (!user || user.sessionVersion !== claims.sessionVersion) return null;
  return { id: user.id, email: user.email, name: user.name, emailVerified: user.emailVerified };
}

/** The signed-in user; throws unauthorized:session otherwise. */
export async function requireUser(): Promise<SessionUser> {
  const u = await currentUser();
  if (!u) throw new AppError('unauthorized:session', 'Please sign in.');
  return u;
}
