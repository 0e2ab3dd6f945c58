import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { SignInForm } from '@/components/auth/sign-in-form';
import { Wordmark } from '@/components/wordmark';
import { currentUser } from '@/lib/auth/session';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  if (await currentUser()) redirect('/');
  const { callbackUrl } = await searchParams;
  // Only same-site paths are followed after sign-in.
  const next = callbackUrl && callbackUrl.startsWith('/') && !callbackUrl.startsWith('//') ? callbackUrl : '/';
  return (
    <main className="margin-rule min-h-screen">
      <div className="mx-auto grid max-w-5xl gap-12 px-6 py-16 pl-20 md:grid-cols-[1.1fr_1fr]">
        <section>
          <Wordmark />
          <h1 className="mt-10 text-4xl leading-tight font-semibold">Every estimate, with its accuracy beside it.</h1>
          <p className="mt-4 max-w-prose text-lg text-ink-soft">
            Write the memo around live numbers. Margin recomputes standard errors and confidence intervals by resampling
            whenever the data or settings change, so coauthors, reviewers and the PI always read the same, current result.
          </p>
          <dl className="mt-8 grid max-w-md grid-cols-3 gap-4 text-sm">
            <div className="border-l-2 border-oxide pl-3">
              <dt className="text-ink-faint">Estimate</dt>
              <dd className="font-mono">θ̂ ± SE</dd>
            </div>
            <div className="border-l-2 border-river pl-3">
              <dt className="text-ink-faint">Interval</dt>
              <dd className="font-mono">BCa 95%</dd>
            </div>
            <div className="border-l-2 border-moss pl-3">
              <dt className="text-ink-faint">Sealed</dt>
              <dd className="font-mono">signed + witnessed</dd>
            </div>
          </dl>
        </section>
        <section className="self-start rounded-lg border border-paper-edge bg-white/70 p-8 shadow-sm">
          <h2 className="text-2xl font-semibold">Sign in</h2>
          <p className="mt-1 text-sm text-ink-faint">Use the e-mail address your lab invited.</p>
          <SignInForm next={next} />
          <p className="mt-6 flex flex-wrap justify-between gap-2 text-sm">
            <Link href="/forgot-password" className="text-river underline">
              Forgot your password?
            </Link>
            <Link href="/sign-up" className="text-river underline">
              Create an account
            </Link>
          </p>
        </section>
      </div>
    </main>
  );
}
