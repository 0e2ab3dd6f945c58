'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { signUpSchema } from '@/lib/accounts/schema';
import { Field, FormStatus, SubmitButton } from './field';
import { callApi, useJsonForm } from './form-kit';

export function SignUpForm() {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    signUpSchema,
    ['name', 'email', 'password'],
    (data) => callApi('/api/account', 'POST', data),
    async (_result, data) => {
      const res = await signIn('credentials', { email: data.email, password: data.password, redirect: false });
      if (!res || res.error) {
        setState({ errors: {}, message: 'Your account is ready, but signing in failed. Please sign in.' });
        router.push('/sign-in');
        return;
      }
      router.replace('/labs/new');
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <Field label="Your name" name="name" autoComplete="name" maxLength={120} error={state.errors.name} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" error={state.errors.email} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.errors.password} />
      <FormStatus message={state.message} tone={state.tone} />
      <div className="[&>button]:w-full">
        <SubmitButton pending={pending} label="Create account" pendingLabel="Creating your account…" />
      </div>
    </form>
  );
}
