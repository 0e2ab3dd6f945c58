import 'server-only';
import { getServerSession } from 'next-auth';
import { authOptions } from './options';

/** What a session token says: who signed in, and with which session version. */
export interface SessionClaims {
  userId: number;
  sessionVersion: number;
}

/**
 * Reads the claims of the current request's session cookie through next-auth. This is the
 * only place that touches next-auth's request context; tests that call route handlers
 * directly replace this module with `vi.mock('@/lib/auth/session-source', …)` (see
 * tests/authz/README.md), so production code carries no test switch.
 */
export async function readSessionClaims(): Promise<SessionClaims | null> {
  const session = await getServerSession(authOptions);
  const u = session?.user as { id?: number; sv?: number } | undefined;
  if (!u?.id) return null;
  return { userId: u.id, sessionVersion: u.sv ?? 0 };
}
