import 'server-only';
import { getServerSession } from 'next-auth';
import { AppError } from '../errors';
import { authOptions } from './options';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
}

/** The signed-in user, or null. */
export async function currentUser(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions);
  const u = session?.user as { id?: number; email?: string | null; name?: string | null } | undefined;
  if (!u?.id) return null;
  return { id: u.id, email: u.email ?? '', name: u.name ?? '' };
}

/** The signed-in user; throws unauthorized:session otherwise. */
export async function requireUser(): Promise<SessionUser> {
  const u = await currentUser();
  if (!u) throw new AppError('unauthorized:session', 'Please sign in.');
  return u;
}
