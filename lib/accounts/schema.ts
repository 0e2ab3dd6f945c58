import { z } from 'zod';

/**
 * Account form schemas, shared by the browser forms and the route handlers (validated on
 * both sides). Messages are written for the person filling in the form.
 */

// No control characters (tabs, newlines, NUL…) in one-line fields; anything else is text.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f]/;

export const emailField = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(254, 'An e-mail address has at most 254 characters.')
  .pipe(z.email('Enter an e-mail address like name@example.org.'))
  .transform((s) => s.toLowerCase());

export const personName = z
  .string({ error: 'Enter your name.' })
  .trim()
  .min(1, 'Enter your name.')
  .max(120, 'A name has at most 120 characters.')
  .refine((s) => !CONTROL.test(s), 'A name cannot contain line breaks or control characters.');

/**
 * bcrypt reads at most 72 bytes of a password, so longer ones are refused rather than
 * silently cut; 10 characters is a common-practice minimum for a password without other rules.
 */
export const newPassword = z
  .string({ error: 'Choose a password.' })
  .min(10, 'Use at least 10 characters.')
  .max(200, 'A password has at most 72 bytes.')
  .refine((s) => new TextEncoder().encode(s).length <= 72, 'A password has at most 72 bytes (fewer characters if you use accents or symbols).');

export const currentPassword = z.string({ error: 'Enter your current password.' }).min(1, 'Enter your current password.').max(200, 'Password is too long.');

export const tokenField = z
  .string({ error: 'The link is incomplete.' })
  .regex(/^[A-Za-z0-9_-]{43}$/, 'The link is incomplete or damaged: open it again from the e-mail.');

export const signUpSchema = z.object({ name: personName, email: emailField, password: newPassword });
export type SignUpInput = z.infer<typeof signUpSchema>;

export const profileSchema = z.object({ name: personName });

export const changePasswordSchema = z.object({ currentPassword, newPassword });

export const resetRequestSchema = z.object({ email: emailField });

export const resetConfirmSchema = z.object({ token: tokenField, password: newPassword });

export const verifySchema = z.object({ token: tokenField });
