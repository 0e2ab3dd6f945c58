'use client';

import { useRouter } from 'next/navigation';
import { Field, FormStatus, SubmitButton } from '@/components/auth/field';
import { callApi, useJsonForm } from '@/components/auth/form-kit';
import { createLabSchema } from '@/lib/labs/schema';

export function CreateLabForm() {
  const router = useRouter();
  const { state, pending, onSubmit } = useJsonForm(
    createLabSchema,
    ['name'],
    (data) => callApi('/api/labs', 'POST', data),
    (result) => {
      const { lab } = result.data as { lab: { id: number } };
      router.push(`/labs/${lab.id}/members`);
      router.refresh();
    },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <Field label="Lab name" name="name" maxLength={120} hint="For example: Estuary nitrate survey." error={state.errors.name} />
      <FormStatus message={state.message} tone={state.tone} />
      <SubmitButton pending={pending} label="Create lab" pendingLabel="Creating…" />
    </form>
  );
}
