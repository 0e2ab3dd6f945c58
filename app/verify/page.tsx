import type { Metadata } from 'next';
import Link from 'next/link';
import { AuthCard } from '@/components/auth/auth-card';
import { VerifyEmailForm } from '@/components/auth/verify-email-form';
import { TOKEN_PATTERN } from '@/lib/auth/tokens';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Confirm your e-mail address', referrer: 'no-referrer' };

export default async function VerifyPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!token || !TOKEN_PATTERN.test(token)) {
    return (
      <AuthCard title="This confirmation link is incomplete">
        <p className="mt-4 text-ink-soft">
          Open the link again from the e-mail, or ask for a new one on your{' '}
          <Link href="/account" className="text-river underline">
            account page
          </Link>
          .
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Confirm your e-mail address" lead="One click, and your account is fully set up.">
      <VerifyEmailForm token={token} />
    </AuthCard>
  );
}
