import 'server-only';
import { consumeAuthToken, insertAuthToken } from '@/db/queries/auth-tokens';
import { markEmailVerified } from '@/db/queries/users';
import { recordAudit } from '../audit';
import { hashToken, newToken } from '../auth/tokens';
import { AppError } from '../errors';
import { appUrl } from '../mail/config';
import { sendMail } from '../mail/send';
import { verifyEmailMail } from '../mail/templates/verify-email';

// A day: long enough to find the mail the next morning, short enough that an old mailbox
// leak does not verify anything (common practice).
const VERIFY_TTL_MS = 24 * 60 * 60 * 1000;

/** Issues a verification link and mails it. */
export async function sendVerification(user: { id: number; email: string; name: string }, now = new Date()): Promise<void> {
  const { token, hash } = newToken();
  const expiresAt = new Date(now.getTime() + VERIFY_TTL_MS);
  await insertAuthToken({ userId: user.id, purpose: 'verify-email', tokenHash: hash, expiresAt });
  await sendMail({ to: user.email, ...verifyEmailMail({ name: user.name, url: `${appUrl()}/verify?token=${token}`, expiresAt }) });
}

const REASON = {
  unknown: 'This confirmation link is not valid. Ask for a new one from your account page.',
  expired: 'This confirmation link has expired. Ask for a new one from your account page.',
  used: 'This confirmation link has already been used.',
} as const;

/** Uses a verification link: marks the address verified. Throws invalid:token with the reason. */
export async function confirmVerification(token: string, now = new Date()): Promise<{ userId: number }> {
  const r = await consumeAuthToken(hashToken(token), 'verify-email', now, async (tx, userId) => {
    await markEmailVerified(userId, tx);
    await recordAudit({ labId: null, actorId: userId, action: 'account.email-verified', subject: `user:${userId}` }, tx);
  });
  if (!r.ok) throw new AppError('invalid:token', REASON[r.reason], 'token');
  return { userId: r.userId };
}
