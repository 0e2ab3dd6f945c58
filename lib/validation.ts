import type { z } from 'zod';
import { AppError } from './errors';

/** Dotted path of a zod issue, e.g. `intervals.level` or `rows.3.value`. */
export function issuePath(path: ReadonlyArray<PropertyKey>): string {
  return path.map(String).join('.');
}

/** Turns the first zod issue into an AppError naming the field. */
export function zodToAppError(error: z.ZodError, subject: string): AppError {
  const first = error.issues[0];
  const p = first ? issuePath(first.path) : '';
  const message = first ? (p ? `${p}: ${first.message}` : first.message) : 'invalid input';
  return new AppError(`invalid:${subject}`, message, p);
}

/** safeParse that throws an AppError naming the first bad field. */
export function parseWith<S extends z.ZodType>(schema: S, input: unknown, subject: string): z.infer<S> {
  const r = schema.safeParse(input);
  if (!r.success) throw zodToAppError(r.error, subject);
  return r.data;
}

/** zod's flattened field errors, for forms: { field: [messages] }. */
export function fieldErrors(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issuePath(issue.path) || '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
