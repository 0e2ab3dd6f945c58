import type { Metadata } from 'next';
import Link from 'next/link';
import { AuthCard } from '@/components/auth/auth-card';
import { SignOutButton } from '@/components/auth/sign-out-button';
import { currentUser } from '@/lib/auth/session';
import { TOKEN_PATTERN } from '@/lib/auth/tokens';
import { describeInvitation } from '@/lib/labs/invitations';
import { ROLE_LABEL } from '@/lib/labs/schema';
import { AcceptInvitation } from './accept-form';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Invitation', referrer: 'no-referrer' };

/**
 * The page an invitation link opens. It only shows; accepting is a POST from the button
 * (mail scanners that open links must not use up the invitation).
 */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = TOKEN_PATTERN.test(token) ? await describeInvitation(token) : null;
  if (!invitation) {
    return (
      <AuthCard title="This invitation link is not valid">
        <p className="mt-4 text-ink-soft">Check that the whole link was copied from the e-mail, or ask the lab&apos;s Owner for a new invitation.</p>
      </AuthCard>
    );
  }
  if (invitation.state !== 'pending') {
    return (
      <AuthCard title={`Invitation to ${invitation.labName}`}>
        <p className="mt-4 text-ink-soft" role="status">
          {invitation.message}
        </p>
      </AuthCard>
    );
  }
  const user = await currentUser();
  const lead = (
    <>
      {invitation.invitedByName ?? 'An Owner'} invited <strong className="font-medium text-ink">{invitation.email}</strong> to join as{' '}
      <strong className="font-medium text-ink">{ROLE_LABEL[invitation.role]}</strong>.
    </>
  );
  const title = `Join ${invitation.labName}`;

  if (user && user.email !== invitation.email) {
    return (
      <AuthCard title={title} lead={lead}>
        <p className="mt-4 text-ink-soft">
          You are signed in as {user.email}. This invitation is only for {invitation.email}: sign out, then open the link again.
        </p>
        <div className="mt-4">
          <SignOutButton />
        </div>
      </AuthCard>
    );
  }
  if (!user && invitation.accountExists) {
    return (
      <AuthCard title={title} lead={lead}>
        <p className="mt-4 text-ink-soft">There is already a Margin account for {invitation.email}. Sign in with it to accept.</p>
        <Link href={`/sign-in?callbackUrl=${encodeURIComponent(`/invitations/${token}`)}`} className="mt-4 inline-block rounded-md bg-ink px-4 py-2.5 font-medium text-paper">
          Sign in to accept
        </Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title={title} lead={lead}>
      <AcceptInvitation token={token} email={invitation.email} newAccount={!user} />
      <p className="mt-4 text-xs text-ink-faint">The invitation expires on {invitation.expiresAt.toUTCString()}.</p>
    </AuthCard>
  );
}
