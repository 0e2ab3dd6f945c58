'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Field, FormStatus, SubmitButton } from '@/components/auth/field';
import { callApi, useJsonForm } from '@/components/auth/form-kit';
import { changePasswordSchema, profileSchema } from '@/lib/accounts/schema';

export function ProfileForm({ name, email }: { name: string; email: string }) {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    profileSchema,
    ['name'],
    (data) => callApi('/api/account', 'PATCH', data),
    () => {
      setState({ errors: {}, message: 'Saved.', tone: 'ok' });
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
      <Field label="E-mail" name="email" defaultValue={email} readOnly hint="Your address is how labs invite you; it cannot be changed here." />
      <Field label="Name" name="name" defaultValue={name} autoComplete="name" maxLength={120} error={state.errors.name} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Save name" pendingLabel="Saving…" tone="quiet" />
    </form>
  );
}

/** After the change every session ends (this one too), so the form signs in again with the new password. */
export function ChangePasswordForm({ email }: { email: string }) {
  const router = useRouter();
  const { state, setState, pending, onSubmit } = useJsonForm(
    changePasswordSchema,
    ['currentPassword', 'newPassword'],
    (data) => callApi('/api/account/password', 'POST', data),
    async (_result, data) => {
      const res = await signIn('credentials', { email, password: data.newPassword, redirect: false });
      if (!res || res.error) {
        router.push('/sign-in');
        return;
      }
      setState({ errors: {}, message: 'Password changed. Other sessions are signed out.', tone: 'ok' });
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
      <Field label="Current password" name="currentPassword" type="password" autoComplete="current-password" error={state.errors.currentPassword} />
      <Field label="New password" name="newPassword" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.errors.newPassword} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Change password" pendingLabel="Changing…" tone="quiet" />
    </form>
  );
}

export function ResendVerification({ email }: { email: string }) {
  const [message, setMessage] = useState<{ text: string; tone: 'ok' | 'error' }>();
  const [pending, setPending] = useState(false);
  return (
    <div className="space-y-2">
      <p className="text-ink-soft">
        Your address <strong className="font-medium text-ink">{email}</strong> is not confirmed yet.
      </p>
      <button
        type="button"
        disabled={pending}
        className="rounded-md border border-paper-edge bg-white px-3 py-1.5 hover:bg-paper-deep disabled:opacity-60"
        onClick={async () => {
          setPending(true);
          const r = await callApi<{ message: string }>('/api/account/verification', 'POST');
          setPending(false);
          setMessage(r.ok ? { text: r.data.message, tone: 'ok' } : { text: r.message, tone: 'error' });
        }}
      >
        Send the confirmation link again
      </button>
      <FormStatus message={message?.text} tone={message?.tone} />
    </div>
  );
}
