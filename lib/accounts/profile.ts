import 'server-only';
import { findUserById, setPasswordHash, setUserName } from '@/db/queries/users';
import { recordAudit } from '../audit';
import { hashPassword, verifyPassword } from '../auth/password';
import { assertWithinLimit, consumeLimit, recordAttempt } from '../auth/rate-limit';
import { AppError } from '../errors';
import { sendVerification } from './verification';

export async function renameAccount(userId: number, name: string): Promise<void> {
  await setUserName(userId, name);
}

/**
 * Changes the password after checking the current one (wrong guesses are rate-limited like
 * sign-in). Every session, this one included, ends: the browser signs in again with the new
 * password.
 */
export async function changePassword(userId: number, current: string, next: string): Promise<void> {
  const user = await findUserById(userId);
  if (!user) throw new AppError('unauthorized:session', 'Please sign in.');
  const keys = { account: user.email };
  await assertWithinLimit('change-password', keys);
  if (!(await verifyPassword(current, user.passwordHash))) {
    await recordAttempt('change-password', keys);
    throw new AppError('invalid:password', 'That is not your current password.', 'currentPassword');
  }
  await setPasswordHash(userId, await hashPassword(next));
  await recordAudit({ labId: null, actorId: userId, action: 'account.password-changed', subject: `user:${userId}` });
}

/** Mails a fresh verification link (at most a few an hour). */
export async function resendVerification(userId: number): Promise<void> {
  const user = await findUserById(userId);
  if (!user) throw new AppError('unauthorized:session', 'Please sign in.');
  if (user.emailVerified) throw new AppError('conflict:verification', 'Your e-mail address is already confirmed.');
  await consumeLimit('verify-resend', { account: user.email });
  await sendVerification(user);
}
