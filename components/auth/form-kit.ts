'use client';

import { useState } from 'react';
import type { z } from 'zod';

/** Field errors by field name (first message only) plus a form-level message. */
export interface FormState {
  errors: Record<string, string | undefined>;
  message?: string;
  tone?: 'error' | 'ok';
}

export type ApiResult<T = unknown> = { ok: true; status: number; data: T } | { ok: false; status: number; code: string; message: string; path: string };

/** Sends JSON to one of our routes and reads `{ error: { code, message, path } }` on failure. */
export async function callApi<T = unknown>(url: string, method: string, body?: unknown): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method, headers: body === undefined ? undefined : { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, code: 'unavailable:network', message: 'Margin could not be reached. Check your connection and try again.', path: '' };
  }
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON */
  }
  if (res.ok) return { ok: true, status: res.status, data: json as T };
  const err = (json as { error?: { code?: string; message?: string; path?: string } } | null)?.error;
  return { ok: false, status: res.status, code: err?.code ?? 'internal:server', message: err?.message ?? 'Something went wrong on the server. Please try again.', path: err?.path ?? '' };
}

/** Reads named fields from a form into a plain object (strings only). */
export function formValues(form: HTMLFormElement, names: string[]): Record<string, string> {
  const data = new FormData(form);
  return Object.fromEntries(names.map((n) => [n, String(data.get(n) ?? '')]));
}

/**
 * A form's state and submit flow: validate with the shared zod schema in the browser,
 * show the first message per field beside the field, send, and show the server's answer —
 * beside the field it names (`path`) or in the form's status line.
 */
export function useJsonForm<S extends z.ZodType>(schema: S, fields: string[], send: (data: z.infer<S>) => Promise<ApiResult>, onDone: (result: ApiResult & { ok: true }, data: z.infer<S>) => void | Promise<void>) {
  const [state, setState] = useState<FormState>({ errors: {} });
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const parsed = schema.safeParse(formValues(event.currentTarget, fields));
    if (!parsed.success) {
      const errors: FormState['errors'] = {};
      for (const issue of parsed.error.issues) errors[String(issue.path[0] ?? '_form')] ??= issue.message;
      setState({ errors, message: 'Please correct the marked fields.' });
      return;
    }
    setPending(true);
    setState({ errors: {} });
    const result = await send(parsed.data);
    if (result.ok) {
      await onDone(result, parsed.data);
      setPending(false);
      return;
    }
    setPending(false);
    const field = result.path.split('.')[0];
    if (field && fields.includes(field)) setState({ errors: { [field]: result.message }, message: 'Please correct the marked fields.' });
    else setState({ errors: {}, message: result.message });
  }

  return { state, setState, pending, onSubmit };
}
