'use client';

import Link from 'next/link';
import { useState } from 'react';
import { resetConfirmSchema } from '@/lib/accounts/schema';
import { Field, FormStatus, SubmitButton } from './field';
import { callApi, useJsonForm } from './form-kit';

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState(false);
  const { state, setState, pending, onSubmit } = useJsonForm(
    resetConfirmSchema,
    ['token', 'password'],
    (data) => callApi('/api/account/password-reset/confirm', 'POST', data),
    (result) => {
      setDone(true);
      setState({ errors: {}, message: (result.data as { message: string }).message, tone: 'ok' });
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <input type="hidden" name="token" value={token} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters. Every other session will be signed out." error={state.errors.password} />
      {state.errors.token && <p className="text-sm text-oxide">{state.errors.token}</p>}
      <FormStatus message={state.message} tone={state.tone} />
      {done ? (
        <Link href="/sign-in" className="inline-block rounded-md bg-ink px-4 py-2.5 font-medium text-paper">
          Sign in
        </Link>
      ) : (
        <SubmitButton pending={pending} label="Set new password" pendingLabel="Saving…" />
      )}
    </form>
  );
}
