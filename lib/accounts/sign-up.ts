import 'server-only';
import { isDuplicateKey } from '@/db/queries/errors';
import { findUserByEmail, insertUser } from '@/db/queries/users';
import { recordAudit } from '../audit';
import { hashPassword } from '../auth/password';
import { consumeLimit } from '../auth/rate-limit';
import { AppError } from '../errors';
import type { SignUpInput } from './schema';
import { sendVerification } from './verification';

/**
 * Creates an account (e-mail not yet verified) and mails the verification link. An address
 * that already has an account is refused with a message pointing to sign-in and reset;
 * that tells a caller the address is registered, which the per-address limit keeps slow.
 * If the mail cannot be sent the account stays: the person can sign in and ask again.
 */
export async function signUp(input: SignUpInput, address: string): Promise<{ userId: number; mailSent: boolean }> {
  await consumeLimit('sign-up', { address });
  const taken = new AppError('conflict:account', 'An account with this e-mail address already exists. Sign in, or reset your password.', 'email');
  if (await findUserByEmail(input.email)) throw taken;
  const passwordHash = await hashPassword(input.password);
  let userId: number;
  try {
    userId = await insertUser({ email: input.email, name: input.name, passwordHash, emailVerified: false });
  } catch (e) {
    if (isDuplicateKey(e)) throw taken;
    throw e;
  }
  await recordAudit({ labId: null, actorId: userId, action: 'account.created', subject: `user:${userId}` });
  let mailSent = true;
  try {
    await sendVerification({ id: userId, email: input.email, name: input.name });
  } catch (e) {
    if (!(e instanceof AppError)) throw e;
    mailSent = false;
  }
  return { userId, mailSent };
}
