// Authorization rows: the account routes (sign-up, profile, password, verification, reset).
import { EVERYONE, SIGNED_IN, sql, tokenFor, type AuthzRow } from './_kit';

export default [
  { method: 'GET', path: '/api/account', allowed: SIGNED_IN },
  {
    method: 'POST',
    path: '/api/account',
    name: 'sign up with a new address (open to anyone)',
    request: (f) => ({ body: { name: `New ${f.unique}`, email: `new-${f.unique}@example.org`, password: 'a long enough password' } }),
    allowed: EVERYONE,
  },
  { method: 'PATCH', path: '/api/account', request: () => ({ body: { name: 'Renamed Person' } }), allowed: SIGNED_IN },
  {
    method: 'POST',
    path: '/api/account/password',
    request: (f) => ({ body: { currentPassword: f.me?.password ?? 'not-signed-in', newPassword: 'a brand new password' } }),
    allowed: SIGNED_IN,
  },
  {
    method: 'POST',
    path: '/api/account/verification',
    name: "resend the caller's confirmation link (caller's address not yet confirmed)",
    request: async (f) => {
      if (f.me) await sql('UPDATE users SET email_verified = 0 WHERE id = ?', [f.me.id]);
      return {};
    },
    allowed: SIGNED_IN,
  },
  {
    method: 'POST',
    path: '/api/account/verification/confirm',
    name: 'the token is the credential',
    request: async (f) => ({ body: { token: await tokenFor(f.people.reader.id, 'verify-email') } }),
    allowed: EVERYONE,
  },
  {
    method: 'POST',
    path: '/api/account/password-reset',
    request: (f) => ({ body: { email: f.people.reader.email } }),
    allowed: EVERYONE,
  },
  {
    method: 'POST',
    path: '/api/account/password-reset/confirm',
    name: 'the token is the credential',
    request: async (f) => ({ body: { token: await tokenFor(f.people.reader.id, 'reset-password'), password: 'a brand new password' } }),
    allowed: EVERYONE,
  },
] satisfies AuthzRow[];
