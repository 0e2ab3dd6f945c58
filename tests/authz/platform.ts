// Authorization rows: platform routes (health, Auth.js).
import { EVERYONE, NOBODY, type AuthzRow } from './_kit';

export default [
  { method: 'GET', path: '/api/health', allowed: EVERYONE },
  {
    method: 'GET',
    path: '/api/auth/[...nextauth]',
    allowed: NOBODY,
    exempt: "Auth.js's own handler (session, CSRF token, providers); it needs Next's request context. Sign-in is covered by tests/integration/auth-sign-in.test.ts and the browser tests.",
  },
  {
    method: 'POST',
    path: '/api/auth/[...nextauth]',
    allowed: NOBODY,
    exempt: "Auth.js's own handler, protected by its own CSRF token; sign-in goes through lib/auth/sign-in.ts, tested in tests/integration/auth-sign-in.test.ts.",
  },
] satisfies AuthzRow[];
