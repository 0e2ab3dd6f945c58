// Unit: module boundaries of the accounts area — browser components declare 'use client',
// server modules (database, tokens, mail, sessions) import 'server-only' so they can never be
// bundled for the browser, and the shared form schemas stay importable from both sides.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const read = (p: string) => readFileSync(p, 'utf8');
const firstStatement = (text: string) => text.replace(/^(\s*(\/\/[^\n]*\n|\/\*[\s\S]*?\*\/))*/, '').trimStart().split('\n')[0];

describe('accounts area module boundaries', () => {
  it("starts every client component with 'use client'", () => {
    for (const f of [
      'components/auth/sign-in-form.tsx',
      'components/auth/sign-up-form.tsx',
      'components/auth/forgot-password-form.tsx',
      'components/auth/reset-password-form.tsx',
      'components/auth/verify-email-form.tsx',
      'components/auth/form-kit.ts',
      'app/account/forms.tsx',
      'app/labs/new/create-lab-form.tsx',
      'app/labs/[labId]/members/members-panel.tsx',
      'app/invitations/[token]/accept-form.tsx',
    ]) {
      expect(firstStatement(read(f)), f).toMatch(/^['"]use client['"]/);
    }
  });

  it("marks server modules with import 'server-only'", () => {
    for (const f of [
      'lib/auth/session.ts',
      'lib/auth/session-source.ts',
      'lib/auth/options.ts',
      'lib/auth/sign-in.ts',
      'lib/auth/tokens.ts',
      'lib/auth/rate-limit.ts',
      'lib/audit.ts',
      'lib/mail/send.ts',
      'lib/mail/config.ts',
      'lib/accounts/sign-up.ts',
      'lib/accounts/password-reset.ts',
      'lib/accounts/verification.ts',
      'lib/accounts/profile.ts',
      'lib/labs/labs.ts',
      'lib/labs/members.ts',
      'lib/labs/invitations.ts',
      'db/queries/auth-tokens.ts',
      'db/queries/invitations.ts',
      'db/queries/rate-limits.ts',
      'db/queries/audit.ts',
      'db/queries/dev-mail.ts',
    ]) {
      expect(read(f), f).toMatch(/^import 'server-only';/m);
    }
  });

  it('keeps the shared schemas free of server imports (the browser forms use them)', () => {
    for (const f of ['lib/accounts/schema.ts', 'lib/labs/schema.ts']) {
      const text = read(f);
      expect(text, f).not.toMatch(/server-only|@\/db\/|node:/);
    }
  });

  it('calls the Origin check first in every state-changing route of this area', () => {
    const routes = [
      'app/api/account/route.ts',
      'app/api/account/password/route.ts',
      'app/api/account/verification/route.ts',
      'app/api/account/verification/confirm/route.ts',
      'app/api/account/password-reset/route.ts',
      'app/api/account/password-reset/confirm/route.ts',
      'app/api/labs/route.ts',
      'app/api/labs/[labId]/route.ts',
      'app/api/labs/[labId]/members/[userId]/route.ts',
      'app/api/labs/[labId]/membership/route.ts',
      'app/api/labs/[labId]/invitations/route.ts',
      'app/api/labs/[labId]/invitations/[invitationId]/route.ts',
      'app/api/invitations/accept/route.ts',
    ];
    let seen = 0;
    for (const f of routes) {
      const text = read(f);
      for (const m of text.matchAll(/export const (POST|PUT|PATCH|DELETE) = route[^\n]*=> \{\n([^\n]*)/g)) {
        expect(m[2].trim(), `${f} ${m[1]}`).toBe('assertSameOrigin(request);');
        seen++;
      }
    }
    // 15 state-changing handlers in these 13 files (the pattern must not match nothing).
    expect(seen).toBe(15);
  });
});
