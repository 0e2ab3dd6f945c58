import 'server-only';
import { getDb } from '@/db/client';
import { isDuplicateKey } from '@/db/queries/errors';
import {
  deleteInvitation,
  findInvitationByHash,
  findInvitationInLab,
  insertInvitation,
  lockInvitationByHash,
  markInvitationAccepted,
  markInvitationRevoked,
  revokePendingFor,
} from '@/db/queries/invitations';
import { addMember, findLab, isMember, membershipOf } from '@/db/queries/labs';
import { findUserByEmail, insertUser, markEmailVerified } from '@/db/queries/users';
import type { Invitation, Role } from '@/db/schema';
import { recordAudit } from '../audit';
import { hashPassword } from '../auth/password';
import { consumeLimit } from '../auth/rate-limit';
import type { SessionUser } from '../auth/session';
import { hashToken, newToken } from '../auth/tokens';
import { AppError } from '../errors';
import { appUrl } from '../mail/config';
import { sendMail } from '../mail/send';
import { invitationMail } from '../mail/templates/invitation';

// A week: time for a colleague back from fieldwork to find the mail (common practice).
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

/**
 * An Owner invites an address with a role. The inviter's own address must be confirmed
 * (mail goes out in Margin's name). A fresh invitation to the same address replaces the
 * pending one. If the mail cannot be sent, the invitation is deleted again: nothing half-done.
 */
export async function inviteToLab(inviter: SessionUser, labId: number, email: string, role: Role, now = new Date()) {
  if (!inviter.emailVerified) throw new AppError('forbidden:verification', 'Confirm your own e-mail address before inviting others (see your account page).');
  const existing = await findUserByEmail(email);
  if (existing && (await membershipOf(existing.id, labId))) throw new AppError('conflict:member', 'This person is already a member of the lab.', 'email');
  await consumeLimit('invite', { account: inviter.email }, now);
  const lab = await findLab(labId);
  if (!lab) throw new AppError('not_found:lab', 'No such lab, or you are not a member of it.');
  const { token, hash } = newToken();
  const expiresAt = new Date(now.getTime() + INVITATION_TTL_MS);
  const id = await getDb().transaction(async (tx) => {
    await revokePendingFor(labId, email, now, tx);
    return insertInvitation({ labId, email, role, tokenHash: hash, invitedBy: inviter.id, expiresAt }, tx);
  });
  try {
    await sendMail({ to: email, ...invitationMail({ labName: lab.name, inviterName: inviter.name, role, url: `${appUrl()}/invitations/${token}`, expiresAt }) });
  } catch (e) {
    await deleteInvitation(id);
    throw e;
  }
  await recordAudit({ labId, actorId: inviter.id, action: 'invitation.sent', subject: `invitation:${id}`, detail: { email, role } });
  return { id, email, role, expiresAt };
}

export async function revokeInvitation(actorId: number, labId: number, invitationId: number, now = new Date()): Promise<void> {
  const inv = await findInvitationInLab(labId, invitationId);
  if (!inv) throw new AppError('not_found:invitation', 'No such invitation in this lab.');
  if (inv.acceptedAt) throw new AppError('conflict:invitation', 'This invitation has already been accepted; remove the member instead.');
  if (inv.revokedAt) return;
  await markInvitationRevoked(invitationId, now);
  await recordAudit({ labId, actorId, action: 'invitation.revoked', subject: `invitation:${invitationId}`, detail: { email: inv.email, role: inv.role } });
}

export type InvitationState = 'pending' | 'accepted' | 'revoked' | 'expired';

export function stateOf(inv: Pick<Invitation, 'acceptedAt' | 'revokedAt' | 'expiresAt'>, now: Date): InvitationState {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  if (inv.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

const UNUSABLE: Record<Exclude<InvitationState, 'pending'>, string> = {
  accepted: 'This invitation has already been used.',
  revoked: 'This invitation was withdrawn by the lab. Ask its Owner for a new one.',
  expired: 'This invitation has expired. Ask the lab Owner for a new one.',
};

/** What the invitation page shows for a token; null for an unknown token. */
export async function describeInvitation(token: string, now = new Date()) {
  const row = await findInvitationByHash(hashToken(token));
  if (!row) return null;
  const state = stateOf(row.invitation, now);
  const account = await findUserByEmail(row.invitation.email);
  return {
    labId: row.invitation.labId,
    labName: row.labName,
    invitedByName: row.invitedByName,
    email: row.invitation.email,
    role: row.invitation.role,
    expiresAt: row.invitation.expiresAt,
    state,
    message: state === 'pending' ? null : UNUSABLE[state],
    accountExists: !!account,
  };
}

/**
 * Accepts an invitation, once, in one transaction with the invitation row locked.
 * Signed in: the account's address must be the invited one. Signed out: `newAccount` creates
 * the account for the invited address (verified, since the link came to that mailbox);
 * if an account already exists for it, the person must sign in first.
 */
export async function acceptInvitation(input: { token: string; user: SessionUser | null; newAccount?: { name: string; password: string } }, now = new Date()) {
  const passwordHash = !input.user && input.newAccount ? await hashPassword(input.newAccount.password) : null;
  try {
    return await getDb().transaction(async (tx) => {
      const inv = await lockInvitationByHash(tx, hashToken(input.token));
      if (!inv) throw new AppError('not_found:invitation', 'This invitation link is not valid.');
      const state = stateOf(inv, now);
      if (state !== 'pending') throw new AppError(state === 'accepted' ? 'conflict:invitation' : 'invalid:invitation', UNUSABLE[state], 'token');
      let userId: number;
      if (input.user) {
        if (input.user.email !== inv.email) {
          throw new AppError('forbidden:invitation', `This invitation is for ${inv.email}. Sign in with that address to accept it.`);
        }
        userId = input.user.id;
        const already = await isMember(inv.labId, userId, tx);
        if (already) throw new AppError('conflict:member', 'You are already a member of this lab.');
        await markEmailVerified(userId, tx);
      } else {
        if (!input.newAccount || !passwordHash) throw new AppError('unauthorized:session', 'Sign in, or choose a name and password for your new account.');
        if (await findUserByEmail(inv.email, tx)) {
          throw new AppError('conflict:account', `An account for ${inv.email} already exists. Sign in with it to accept the invitation.`);
        }
        userId = await insertUser({ email: inv.email, name: input.newAccount.name, passwordHash, emailVerified: true }, tx);
        await recordAudit({ labId: null, actorId: userId, action: 'account.created', subject: `user:${userId}`, detail: { via: `invitation:${inv.id}` } }, tx);
      }
      await addMember(inv.labId, userId, inv.role, tx);
      await markInvitationAccepted(inv.id, userId, now, tx);
      await recordAudit({ labId: inv.labId, actorId: userId, action: 'invitation.accepted', subject: `invitation:${inv.id}`, detail: { email: inv.email, role: inv.role } }, tx);
      return { labId: inv.labId, role: inv.role, userId, email: inv.email };
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw new AppError('conflict:member', 'You are already a member of this lab, or the account was just created.');
    throw e;
  }
}
