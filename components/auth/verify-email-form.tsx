'use client';

import Link from 'next/link';
import { useState } from 'react';
import { verifySchema } from '@/lib/accounts/schema';
import { FormStatus, SubmitButton } from './field';
import { callApi, useJsonForm } from './form-kit';

/** A button, not an automatic check on page load: mail scanners that open links must not use up the token. */
export function VerifyEmailForm({ token }: { token: string }) {
  const [done, setDone] = useState(false);
  const { state, setState, pending, onSubmit } = useJsonForm(
    verifySchema,
    ['token'],
    (data) => callApi('/api/account/verification/confirm', 'POST', data),
    (result) => {
      setDone(true);
      setState({ errors: {}, message: (result.data as { message: string }).message, tone: 'ok' });
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <input type="hidden" name="token" value={token} />
      <FormStatus message={state.errors.token ?? state.message} tone={state.tone} />
      {done ? (
        <Link href="/" className="inline-block rounded-md bg-ink px-4 py-2.5 font-medium text-paper">
          Continue to Margin
        </Link>
      ) : (
        <SubmitButton pending={pending} label="Confirm my address" pendingLabel="Confirming…" />
      )}
    </form>
  );
}
