'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { z } from 'zod';
import { Field, FormStatus } from './field';

const schema = z.object({
  email: z.email('Enter an e-mail address like name@example.org.').max(254, 'E-mail address is too long.'),
  password: z.string().min(1, 'Enter your password.').max(200, 'Password is too long.'),
});

type Errors = Partial<Record<'email' | 'password' | 'form', string>>;

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Errors>({});
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const parsed = schema.safeParse({ email: form.get('email'), password: form.get('password') });
    if (!parsed.success) {
      const e: Errors = {};
      for (const issue of parsed.error.issues) e[issue.path[0] as 'email' | 'password'] ??= issue.message;
      setErrors(e);
      return;
    }
    setErrors({});
    setPending(true);
    const res = await signIn('credentials', { ...parsed.data, redirect: false });
    setPending(false);
    if (!res || res.error) {
      setErrors({ form: res?.error && res.error !== 'CredentialsSignin' ? res.error : 'That e-mail and password do not match an account.' });
      return;
    }
    router.replace(next);
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      <Field label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" error={errors.password} />
      <FormStatus message={errors.form} />
      <button
        type="submit"
        disabled={pending}
        className="w-full rounded-md bg-ink px-4 py-2.5 font-medium text-paper transition hover:bg-ink-soft disabled:opacity-60"
      >
        {pending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
