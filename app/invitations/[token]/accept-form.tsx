'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { z } from 'zod';
import { Field, FormStatus, SubmitButton } from '@/components/auth/field';
import { callApi, useJsonForm } from '@/components/auth/form-kit';
import { newPassword, personName, tokenField } from '@/lib/accounts/schema';

const existingSchema = z.object({ token: tokenField });
const newAccountSchema = z.object({ token: tokenField, name: personName, password: newPassword });

/** Signed in: one button. Signed out with no account yet: a name and a password, then the new account is signed in. */
export function AcceptInvitation({ token, email, newAccount }: { token: string; email: string; newAccount: boolean }) {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    newAccount ? newAccountSchema : existingSchema,
    newAccount ? ['token', 'name', 'password'] : ['token'],
    (data) => callApi('/api/invitations/accept', 'POST', data),
    async (result, data) => {
      const { lab } = result.data as { lab: { id: number } };
      if (newAccount) {
        const res = await signIn('credentials', { email, password: (data as unknown as { password: string }).password, redirect: false });
        if (!res || res.error) {
          setState({ errors: {}, message: 'You joined the lab. Please sign in.' });
          router.push('/sign-in');
          return;
        }
      }
      router.replace(`/labs/${lab.id}`);
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <input type="hidden" name="token" value={token} />
      {newAccount && (
        <>
          <Field label="E-mail" name="email" defaultValue={email} readOnly />
          <Field label="Your name" name="name" autoComplete="name" maxLength={120} error={state.errors.name} />
          <Field label="Choose a password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.errors.password} />
        </>
      )}
      <FormStatus message={state.errors.token ?? state.message} tone={state.tone} />
      <SubmitButton pending={pending} label={newAccount ? 'Create account and join' : 'Join the lab'} pendingLabel="Joining…" />
    </form>
  );
}
