import 'server-only';
import { findUserByEmail, normaliseEmail } from '@/db/queries/users';
import { recordAudit } from '../audit';
import { assertWithinLimit, clearAccountLimit, recordAttempt } from './rate-limit';
import { verifyPassword } from './password';

// A bcrypt hash of a random string: compared against when the account does not exist, so
// an unknown address takes as long to refuse as a wrong password.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.jZ6Vv7Ww6Q0k3hS6Wq1e6Hf4r7yK';

export interface SignedIn {
  id: number;
  email: string;
  name: string;
  sessionVersion: number;
}

/**
 * Checks an e-mail and password. Refuses with rate_limited (before looking at the password)
 * when the account or the address has had too many failures lately; counts each failure;
 * records successful sign-ins (and failures for a known account) in the audit trail.
 * Returns null when the pair does not match.
 */
export async function signInWithPassword(input: { email: string; password: string; address: string }): Promise<SignedIn | null> {
  const email = normaliseEmail(input.email);
  const keys = { account: email, address: input.address };
  await assertWithinLimit('sign-in', keys);
  const user = await findUserByEmail(email);
  const ok = await verifyPassword(input.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) {
    await recordAttempt('sign-in', keys);
    if (user) await recordAudit({ labId: null, actorId: user.id, action: 'account.sign-in-failed', subject: `user:${user.id}`, detail: { address: input.address } });
    return null;
  }
  await clearAccountLimit('sign-in', email);
  await recordAudit({ labId: null, actorId: user.id, action: 'account.signed-in', subject: `user:${user.id}`, detail: { address: input.address } });
  return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
}
