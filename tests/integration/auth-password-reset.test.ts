// Integration: password reset by e-mailed one-time link, against real MariaDB and the real
// SMTP fake — request, mail, new password, every old session ended; reuse, expiry and
// rate limits refused with clear messages; the same answer for unknown addresses.
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { call, linkIn, makePerson, tokenOf, useMailCatcher } from './auth-support';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();
const mail = useMailCatcher();

const request = () => import('@/app/api/account/password-reset/route');
const confirm = () => import('@/app/api/account/password-reset/confirm/route');
const ask = async (email: string, address = '198.51.100.1') =>
  call(session, (await request()).POST, { url: '/api/account/password-reset', method: 'POST', claims: null, body: { email }, headers: { 'x-forwarded-for': address } });
const use = async (token: string, password: string) => call(session, (await confirm()).POST, { url: '/api/account/password-reset/confirm', method: 'POST', claims: null, body: { token, password } });

describe('password reset', () => {
  it('mails a one-hour link that sets a new password once, ends old sessions and keeps the token only hashed', async () => {
    const p = await makePerson('resetter');
    const r = await ask(p.email);
    expect(r.status).toBe(202);
    const [m] = await mail.to(p.email);
    expect(m.subject).toBe('Reset your Margin password');
    const token = tokenOf(linkIn(m.text, '/reset-password?token='));

    // Before the reset the session is valid; after it, the same session claims are signed out.
    const { currentUser } = await import('@/lib/auth/session');
    session.claims = p.claims;
    expect((await currentUser())?.id).toBe(p.id);
    session.claims = null;

    const done = await use(token, 'a completely new password');
    expect(done.status).toBe(200);
    session.claims = p.claims;
    expect(await currentUser()).toBeNull();
    session.claims = null;

    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    expect(await signInWithPassword({ email: p.email, password: p.password, address: '198.51.100.2' })).toBeNull();
    const fresh = await signInWithPassword({ email: p.email, password: 'a completely new password', address: '198.51.100.2' });
    expect(fresh?.sessionVersion).toBe(1);

    const reused = await use(token, 'yet another new password');
    expect(reused.status).toBe(422);
    expect(reused.json.error).toMatchObject({ code: 'invalid:token', path: 'token' });
    expect(reused.json.error.message).toMatch(/already been used/);

    const { getPool } = await import('@/db/client');
    const [rows] = (await getPool().query('SELECT token_hash FROM auth_tokens WHERE user_id = ?', [p.id])) as unknown as [{ token_hash: string }[]];
    expect(rows.every((row) => /^[0-9a-f]{64}$/.test(row.token_hash) && row.token_hash !== token)).toBe(true);
  });

  it('refuses an expired link, and retires the other pending links once one has worked', async () => {
    const p = await makePerson('expiry');
    for (let k = 0; k < 3; k++) await ask(p.email, '198.51.100.3');
    const [t1, t2, t3] = (await mail.to(p.email)).map((m) => tokenOf(linkIn(m.text, '/reset-password?token=')));
    const { getPool } = await import('@/db/client');
    const { hashToken } = await import('@/lib/auth/tokens');
    await getPool().query('UPDATE auth_tokens SET expires_at = ? WHERE token_hash = ?', [new Date(Date.now() - 1), hashToken(t1)]);
    const expired = await use(t1, 'a completely new password');
    expect(expired.status).toBe(422);
    expect(expired.json.error.message).toMatch(/expired/);
    expect((await use(t3, 'a completely new password')).status).toBe(200);
    const retired = await use(t2, 'a different new password');
    expect(retired.status).toBe(422);
    expect(retired.json.error.message).toMatch(/already been used/);
  });

  it('answers an unknown address exactly like a known one, and sends nothing', async () => {
    const unknown = `nobody-${process.pid}@example.org`;
    const known = await makePerson('known');
    const a = await ask(unknown, '198.51.100.4');
    const b = await ask(known.email, '198.51.100.4');
    expect(a.status).toBe(b.status);
    expect(a.json.message.replace(unknown, 'X')).toBe(b.json.message.replace(known.email, 'X'));
    expect(await mail.to(unknown)).toEqual([]);
    expect(await mail.to(known.email)).toHaveLength(1);
  });

  it('limits requests per account (3 an hour) and per network address (10 an hour), with a clear message', async () => {
    const p = await makePerson('limited');
    for (let k = 0; k < 3; k++) expect((await ask(p.email, `203.0.113.${k + 1}`)).status).toBe(202);
    const fourth = await ask(p.email, '203.0.113.9');
    expect(fourth.status).toBe(429);
    expect(fourth.json.error.code).toBe('rate_limited:password-reset');
    expect(fourth.json.error.message).toMatch(/^Too many password reset requests for this account\. Try again in \d+ minutes?\.$/);
    expect(await mail.to(p.email)).toHaveLength(3);

    // Ten different addresses typed from one network address, then the eleventh is refused.
    for (let k = 0; k < 10; k++) expect((await ask(`spray-${k}-${process.pid}@example.org`, '203.0.113.200')).status).toBe(202);
    const eleventh = await ask(`spray-10-${process.pid}@example.org`, '203.0.113.200');
    expect(eleventh.status).toBe(429);
    expect(eleventh.json.error.message).toMatch(/from your network address/);
  });

  it('lifts the limit once the window has passed (rows older than the window no longer count)', async () => {
    const p = await makePerson('window');
    for (let k = 0; k < 3; k++) await ask(p.email, '203.0.113.50');
    expect((await ask(p.email, '203.0.113.50')).status).toBe(429);
    const { getPool } = await import('@/db/client');
    await getPool().query('UPDATE rate_limit_hits SET created_at = ? WHERE bucket = ?', [new Date(Date.now() - 61 * 60_000), `password-reset:account:${p.email}`]);
    expect((await ask(p.email, '203.0.113.51')).status).toBe(202);
  });

  it('refuses a malformed token or a short password with the field named', async () => {
    const bad = await use('not-a-token', 'a completely new password');
    expect(bad.status).toBe(422);
    expect(bad.json.error.path).toBe('token');
    const short = await use('A'.repeat(43), 'short');
    expect(short.status).toBe(422);
    expect(short.json.error.path).toBe('password');
    const unknown = await use('A'.repeat(43), 'a completely new password');
    expect(unknown.status).toBe(422);
    expect(unknown.json.error.message).toMatch(/not valid/);
  });
});
