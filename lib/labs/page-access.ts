import 'server-only';
import { notFound, redirect } from 'next/navigation';
import { labsForUser, membershipOf } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';
import { can, type Action } from '@/lib/authz';

/** A positive integer id from a URL segment, or null. */
export function idParam(raw: string): number | null {
  const n = Number(raw);
  return Number.isInteger(n) && n > 0 ? n : null;
}

/**
 * The common start of every lab page: a signed-in user (else sign-in, coming back to
 * `returnPath`), the lab id from the URL, and a membership whose role allows `action`.
 * A bad id, a non-member or a role without the action all get "not found", so a lab's
 * existence does not leak. Also loads the user's labs for the shell, in parallel.
 */
export async function labPage(rawLabId: string, returnPath: string, action: Action = 'lab:read') {
  const user = await currentUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnPath)}`);
  const labId = idParam(rawLabId);
  if (!labId) notFound();
  const [membership, labs] = await Promise.all([membershipOf(user.id, labId), labsForUser(user.id)]);
  if (!membership || !can(membership.role, action)) notFound();
  return { user, labId, membership, labs };
}
