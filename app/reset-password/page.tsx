import type { Metadata } from 'next';
import Link from 'next/link';
import { AuthCard } from '@/components/auth/auth-card';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';
import { TOKEN_PATTERN } from '@/lib/auth/tokens';

export const dynamic = 'force-dynamic';
// The token is in the address: do not pass it on to other sites as a referrer.
export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!token || !TOKEN_PATTERN.test(token)) {
    return (
      <AuthCard title="This reset link is incomplete">
        <p className="mt-4 text-ink-soft">
          Open the link again from the e-mail, or{' '}
          <Link href="/forgot-password" className="text-river underline">
            ask for a new one
          </Link>
          .
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password">
      <ResetPasswordForm token={token} />
    </AuthCard>
  );
}
