import { z } from 'zod';
import { emailField, newPassword, personName, tokenField } from '../accounts/schema';

// Role names as stored (lower case); the UI shows them capitalised.
export const ROLE_VALUES = ['owner', 'author', 'reviewer', 'reader'] as const;
export const ROLE_LABEL = { owner: 'Owner', author: 'Author', reviewer: 'Reviewer', reader: 'Reader' } as const;

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f]/;

export const labName = z
  .string({ error: 'Enter a name for the lab.' })
  .trim()
  .min(1, 'Enter a name for the lab.')
  .max(120, 'A lab name has at most 120 characters.')
  .refine((s) => !CONTROL.test(s), 'A lab name cannot contain line breaks or control characters.');

export const roleField = z.enum(ROLE_VALUES, { error: 'Choose one of Owner, Author, Reviewer or Reader.' });

export const createLabSchema = z.object({ name: labName });
export const renameLabSchema = z.object({ name: labName });
export const changeRoleSchema = z.object({ role: roleField });
export const inviteSchema = z.object({ email: emailField, role: roleField });

/** Accepting an invitation: signed in, only the token; signed out, also a name and password for the new account. */
export const acceptInvitationSchema = z.object({
  token: tokenField,
  name: personName.optional(),
  password: newPassword.optional(),
});

/** Route parameters are strings; ids are positive integers. */
export const idParam = z.coerce.number({ error: 'Not an id.' }).int('Not an id.').positive('Not an id.').max(2_147_483_647, 'Not an id.');
