import type { Metadata } from 'next';
import Link from 'next/link';
import { AuthCard } from '@/components/auth/auth-card';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';

export const metadata: Metadata = { title: 'Forgot password' };

export default function ForgotPasswordPage() {
  return (
    <AuthCard
      title="Forgot your password?"
      lead={
        <>
          We will mail a link to choose a new one. Remembered it?{' '}
          <Link href="/sign-in" className="text-river underline">
            Sign in
          </Link>
          .
        </>
      }
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
