import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { AuthCard } from '@/components/auth/auth-card';
import { SignUpForm } from '@/components/auth/sign-up-form';
import { currentUser } from '@/lib/auth/session';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Create an account' };

export default async function SignUpPage() {
  if (await currentUser()) redirect('/');
  return (
    <AuthCard
      title="Create your Margin account"
      lead={
        <>
          Already have one?{' '}
          <Link href="/sign-in" className="text-river underline">
            Sign in
          </Link>
          . Invited to a lab? Use the link in the invitation instead.
        </>
      }
    >
      <SignUpForm />
    </AuthCard>
  );
}
