// Integration: sign-up and e-mail verification through the route handlers, against real
// MariaDB and the real SMTP fake; bad input (malformed addresses, over-long fields, SQL and
// HTML in names) gets a 422 naming the field and is stored as plain text when valid.
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { call, linkIn, makePerson, tokenOf, useMailCatcher } from './auth-support';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();
const mail = useMailCatcher();

const account = () => import('@/app/api/account/route');
const signUp = async (body: unknown, address = '192.0.2.77') => call(session, (await account()).POST, { url: '/api/account', method: 'POST', claims: null, body, headers: { 'x-forwarded-for': address } });
const verify = async (token: string) => call(session, (await import('@/app/api/account/verification/confirm/route')).POST, { url: '/api/account/verification/confirm', method: 'POST', claims: null, body: { token } });

describe('sign-up and verification', () => {
  it('creates an unconfirmed account, mails a confirmation link that works once', async () => {
    const email = `Signer-${process.pid}@Example.org`;
    const r = await signUp({ name: '  Ada Brook  ', email, password: 'a long enough password' });
    expect(r.status).toBe(201);
    expect(r.json.user).toMatchObject({ email: email.toLowerCase(), name: 'Ada Brook' });
    expect(r.json.verificationMailSent).toBe(true);
    const { findUserByEmail } = await import('@/db/queries/users');
    expect((await findUserByEmail(email))?.emailVerified).toBe(false);

    const [m] = await mail.to(email.toLowerCase());
    expect(m.subject).toBe('Confirm your e-mail address for Margin');
    const token = tokenOf(linkIn(m.text, '/verify?token='));
    expect((await verify(token)).status).toBe(200);
    expect((await findUserByEmail(email))?.emailVerified).toBe(true);
    const again = await verify(token);
    expect(again.status).toBe(422);
    expect(again.json.error.message).toMatch(/already been used/);
  });

  it('refuses a second account for the same address (any case) with a message pointing to sign-in', async () => {
    const p = await makePerson('taken');
    const r = await signUp({ name: 'Dup', email: p.email.toUpperCase(), password: 'a long enough password' });
    expect(r.status).toBe(409);
    expect(r.json.error).toMatchObject({ code: 'conflict:account', path: 'email' });
  });

  it('refuses bad input with a 422 naming the field, and creates nothing', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ name: 'A', email: 'no-at-sign', password: 'a long enough password' }, 'email'],
      [{ name: 'A', email: 'two@@example.org', password: 'a long enough password' }, 'email'],
      [{ name: 'A', email: `${'a'.repeat(245)}@example.org`, password: 'a long enough password' }, 'email'],
      [{ name: '', email: 'blank@example.org', password: 'a long enough password' }, 'name'],
      [{ name: 'x'.repeat(121), email: 'long@example.org', password: 'a long enough password' }, 'name'],
      [{ name: 'Line\nbreak', email: 'lb@example.org', password: 'a long enough password' }, 'name'],
      [{ name: 'A', email: 'short@example.org', password: 'short' }, 'password'],
      [{ name: 'A', email: 'bytes@example.org', password: 'ü'.repeat(40) }, 'password'],
      [{ name: 'A', email: 'type@example.org', password: 12345678901 }, 'password'],
    ];
    for (const [body, path] of cases) {
      const r = await signUp(body, '192.0.2.78');
      expect(r.status, JSON.stringify(body).slice(0, 60)).toBe(422);
      expect(r.json.error.path).toBe(path);
    }
    const notJson = await call(session, (await account()).POST, { url: '/api/account', method: 'POST', claims: null, body: '{"name":', headers: { 'x-forwarded-for': '192.0.2.79' } });
    expect(notJson.status).toBe(400);
    const { getPool } = await import('@/db/client');
    const [rows] = (await getPool().query("SELECT COUNT(*) AS n FROM users WHERE email IN ('blank@example.org','long@example.org','short@example.org')")) as unknown as [{ n: number }[]];
    expect(Number(rows[0].n)).toBe(0);
  });

  it('stores SQL and HTML in a name as text', async () => {
    const name = `Robert'); DROP TABLE users; -- <b>bold</b>`;
    const email = `bobby-${process.pid}@example.org`;
    expect((await signUp({ name, email, password: 'a long enough password' }, '192.0.2.80')).status).toBe(201);
    const { findUserByEmail } = await import('@/db/queries/users');
    expect((await findUserByEmail(email))?.name).toBe(name);
    const [m] = await mail.to(email);
    expect(m.html).toContain('&lt;b&gt;bold&lt;/b&gt;');
    expect(m.html).not.toContain('<b>bold</b>');
  });

  it('limits new accounts to 10 an hour from one network address', async () => {
    for (let k = 0; k < 10; k++) expect((await signUp({ name: 'Many', email: `many-${k}-${process.pid}@example.org`, password: 'a long enough password' }, '192.0.2.200')).status).toBe(201);
    const r = await signUp({ name: 'Many', email: `many-x-${process.pid}@example.org`, password: 'a long enough password' }, '192.0.2.200');
    expect(r.status).toBe(429);
    expect(r.json.error.message).toMatch(/^Too many new accounts from your network address\. Try again in \d+ minutes?\.$/);
  });

  it('resends a confirmation link on request (3 an hour), and refuses once the address is confirmed', async () => {
    const p = await makePerson('resend', { verified: false });
    const resend = await import('@/app/api/account/verification/route');
    const go = () => call(session, resend.POST, { url: '/api/account/verification', method: 'POST', claims: p.claims });
    for (let k = 0; k < 3; k++) expect((await go()).status).toBe(202);
    expect((await go()).status).toBe(429);
    const links = (await mail.to(p.email)).map((m) => tokenOf(linkIn(m.text, '/verify?token=')));
    expect(links).toHaveLength(3);
    expect((await verify(links[1])).status).toBe(200);
    const done = await go();
    expect(done.status).toBe(409);
  });

  it('refuses state-changing calls from another site (Origin check), but not same-site or header-less clients', async () => {
    const body = { name: 'Cross', email: `cross-${process.pid}@example.org`, password: 'a long enough password' };
    const foreign = await call(session, (await account()).POST, { url: '/api/account', method: 'POST', claims: null, body, origin: 'https://elsewhere.example', headers: { 'x-forwarded-for': '192.0.2.90' } });
    expect(foreign.status).toBe(403);
    expect(foreign.json.error.code).toBe('forbidden:origin');
    const viaReferer = await call(session, (await account()).POST, { url: '/api/account', method: 'POST', claims: null, body, origin: null, headers: { referer: 'https://elsewhere.example/page', 'x-forwarded-for': '192.0.2.90' } });
    expect(viaReferer.status).toBe(403);
    const cli = await call(session, (await account()).POST, { url: '/api/account', method: 'POST', claims: null, body, origin: null, headers: { 'x-forwarded-for': '192.0.2.90' } });
    expect(cli.status).toBe(201);
  });
});
