import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { listAccountAudit } from '@/db/queries/audit';
import { labsForUser } from '@/db/queries/labs';
import { currentUser } from '@/lib/auth/session';
import { ChangePasswordForm, ProfileForm, ResendVerification } from './forms';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Account' };

const EVENT_LABEL: Record<string, string> = {
  'account.signed-in': 'Signed in',
  'account.sign-in-failed': 'Failed sign-in (wrong password)',
  'account.password-changed': 'Password changed',
  'account.password-reset': 'Password reset by e-mailed link',
  'account.reset-requested': 'Password reset requested',
  'account.email-verified': 'E-mail address confirmed',
  'account.created': 'Account created',
};

export default async function AccountPage() {
  const user = await currentUser();
  if (!user) redirect('/sign-in?callbackUrl=/account');
  const [labs, events] = await Promise.all([labsForUser(user.id), listAccountAudit(user.id, { limit: 15 })]);
  return (
    <AppShell user={user} labs={labs}>
      <p className="text-sm tracking-wide text-ink-faint uppercase">Account</p>
      <h1 className="text-3xl font-semibold">{user.name}</h1>
      <div className="mt-8 grid gap-8 md:grid-cols-2">
        <section aria-labelledby="profile-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
          <h2 id="profile-heading" className="text-xl font-semibold">
            Profile
          </h2>
          <ProfileForm name={user.name} email={user.email} />
          <div id="verification" className="mt-6 border-t border-paper-edge pt-4 text-sm">
            {user.emailVerified ? (
              <p className="text-moss">Your e-mail address is confirmed.</p>
            ) : (
              <ResendVerification email={user.email} />
            )}
          </div>
        </section>
        <section aria-labelledby="password-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
          <h2 id="password-heading" className="text-xl font-semibold">
            Password
          </h2>
          <ChangePasswordForm email={user.email} />
        </section>
      </div>
      <section aria-labelledby="activity-heading" className="mt-8 rounded-lg border border-paper-edge bg-white/60 p-6">
        <h2 id="activity-heading" className="text-xl font-semibold">
          Recent account activity
        </h2>
        {events.length === 0 ? (
          <p className="mt-3 text-sm text-ink-faint">Nothing yet.</p>
        ) : (
          <table className="mt-3 w-full text-sm">
            <thead className="text-left text-ink-faint">
              <tr>
                <th className="py-1 font-normal">When (UTC)</th>
                <th className="py-1 font-normal">What</th>
                <th className="py-1 font-normal">From</th>
              </tr>
            </thead>
            <tbody className="tabular">
              {events.map((e) => (
                <tr key={e.id} className="border-t border-paper-edge">
                  <td className="py-1.5 font-mono text-xs">{e.createdAt.toISOString().replace('T', ' ').slice(0, 19)}</td>
                  <td className="py-1.5">{EVENT_LABEL[e.action] ?? e.action}</td>
                  <td className="py-1.5 font-mono text-xs text-ink-faint">{String((e.detail as { address?: string } | null)?.address ?? '')}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </AppShell>
  );
}
