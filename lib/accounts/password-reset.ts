import 'server-only';
import { consumeAuthToken, insertAuthToken, retireAuthTokens } from '@/db/queries/auth-tokens';
import { findUserByEmail, markEmailVerified, setPasswordHash } from '@/db/queries/users';
import { recordAudit } from '../audit';
import { hashPassword } from '../auth/password';
import { consumeLimit } from '../auth/rate-limit';
import { hashToken, newToken } from '../auth/tokens';
import { AppError } from '../errors';
import { appUrl } from '../mail/config';
import { sendMail } from '../mail/send';
import { passwordResetMail } from '../mail/templates/password-reset';

// One hour: common practice for reset links, which are worth more to an attacker than
// verification links.
const RESET_TTL_MS = 60 * 60 * 1000;

/**
 * Mails a reset link if the address has an account. The answer is the same either way (so
 * the form does not reveal who has an account); the limits count the typed address and
 * the client address whether or not an account exists.
 */
export async function requestPasswordReset(email: string, address: string, now = new Date()): Promise<void> {
  await consumeLimit('password-reset', { account: email, address }, now);
  const user = await findUserByEmail(email);
  if (!user) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(now.getTime() + RESET_TTL_MS);
  await insertAuthToken({ userId: user.id, purpose: 'reset-password', tokenHash: hash, expiresAt });
  await recordAudit({ labId: null, actorId: user.id, action: 'account.reset-requested', subject: `user:${user.id}`, detail: { address } });
  try {
    await sendMail({ to: user.email, ...passwordResetMail({ name: user.name, url: `${appUrl()}/reset-password?token=${token}`, expiresAt }) });
  } catch (e) {
    // Answering with an error here would tell the caller the account exists; log and move on.
    if (!(e instanceof AppError)) throw e;
    console.error('[margin] reset mail not sent for user', user.id);
  }
}

const REASON = {
  unknown: 'This reset link is not valid. Ask for a new one.',
  expired: 'This reset link has expired. Ask for a new one.',
  used: 'This reset link has already been used. Ask for a new one if you need to.',
} as const;

/**
 * Uses a reset link: sets the new password, ends every session (session version bump),
 * retires the account's other reset links, and marks the address verified (the link
 * proved the person reads that mailbox). All in one transaction with the token's use.
 */
export async function confirmPasswordReset(token: string, password: string, address: string, now = new Date()): Promise<{ userId: number }> {
  await consumeLimit('reset-confirm', { address }, now);
  const passwordHash = await hashPassword(password);
  const r = await consumeAuthToken(hashToken(token), 'reset-password', now, async (tx, userId) => {
    await setPasswordHash(userId, passwordHash, tx);
    await markEmailVerified(userId, tx);
    await retireAuthTokens(userId, 'reset-password', now, tx);
    await recordAudit({ labId: null, actorId: userId, action: 'account.password-reset', subject: `user:${userId}`, detail: { address } }, tx);
  });
  if (!r.ok) throw new AppError('invalid:token', REASON[r.reason], 'token');
  return { userId: r.userId };
}
