'use client';

import { resetRequestSchema } from '@/lib/accounts/schema';
import { Field, FormStatus, SubmitButton } from './field';
import { callApi, useJsonForm } from './form-kit';

export function ForgotPasswordForm() {
  const { state, setState, pending, onSubmit } = useJsonForm(
    resetRequestSchema,
    ['email'],
    (data) => callApi('/api/account/password-reset', 'POST', data),
    (result): void => {
      setState({ errors: {}, message: (result.data as { message: string }).message, tone: 'ok' });
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <Field label="E-mail" name="email" type="email" autoComplete="email" error={state.errors.email} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Send me a reset link" pendingLabel="Sending…" />
    </form>
  );
}
