// Integration: password sign-in (lib/auth/sign-in.ts, what the next-auth credentials provider
// calls) — audit of sign-ins, and the rate limits per account and per network address kept
// in MariaDB, refusing even the right password while a limit holds.
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../support/database';
import { makePerson } from './auth-support';

useTestDatabase();

describe('sign-in', () => {
  it('signs in with the right password (e-mail in any case) and records it in the account audit', async () => {
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    const p = await makePerson('signer');
    const r = await signInWithPassword({ email: p.email.toUpperCase(), password: p.password, address: '192.0.2.1' });
    expect(r).toMatchObject({ id: p.id, email: p.email, sessionVersion: 0 });
    expect(await signInWithPassword({ email: p.email, password: 'wrong password', address: '192.0.2.1' })).toBeNull();
    expect(await signInWithPassword({ email: `nobody-${process.pid}@example.org`, password: 'whatever', address: '192.0.2.1' })).toBeNull();
    const { listAccountAudit } = await import('@/db/queries/audit');
    const events = await listAccountAudit(p.id, { limit: 10 });
    expect(events.map((e) => e.action)).toEqual(['account.sign-in-failed', 'account.signed-in']);
    expect(events[1].detail).toEqual({ address: '192.0.2.1' });
  });

  it('after 8 failures in 15 minutes refuses the account, even with the right password, from any address', async () => {
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    const p = await makePerson('guessed');
    for (let k = 0; k < 8; k++) expect(await signInWithPassword({ email: p.email, password: `guess ${k}`, address: `192.0.2.${10 + k}` })).toBeNull();
    const refused = signInWithPassword({ email: p.email, password: p.password, address: '192.0.2.99' });
    await expect(refused).rejects.toMatchObject({ code: 'rate_limited:sign-in' });
    await expect(signInWithPassword({ email: p.email, password: p.password, address: '192.0.2.99' })).rejects.toThrow(
      /^Too many failed sign-in attempts for this account\. Try again in (1[0-5]|[1-9]) minutes?\.$/,
    );
  });

  it('forgets an account’s failures after a successful sign-in', async () => {
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    const p = await makePerson('forgetful');
    for (let k = 0; k < 7; k++) await signInWithPassword({ email: p.email, password: 'nope nope', address: '192.0.2.30' });
    expect(await signInWithPassword({ email: p.email, password: p.password, address: '192.0.2.30' })).not.toBeNull();
    for (let k = 0; k < 7; k++) await signInWithPassword({ email: p.email, password: 'nope nope', address: '192.0.2.31' });
    expect(await signInWithPassword({ email: p.email, password: p.password, address: '192.0.2.31' })).not.toBeNull();
  });

  it('after 40 failures from one network address refuses that address for every account, but not other addresses', async () => {
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    const victim = await makePerson('bystander');
    for (let k = 0; k < 40; k++) await signInWithPassword({ email: `spray-${k}-${process.pid}@example.org`, password: 'password1', address: '198.18.0.1' });
    await expect(signInWithPassword({ email: victim.email, password: victim.password, address: '198.18.0.1' })).rejects.toThrow(/from your network address/);
    expect(await signInWithPassword({ email: victim.email, password: victim.password, address: '198.18.0.2' })).not.toBeNull();
  });

  it('keeps the limit in the database: the count survives a new connection pool (as after a restart)', async () => {
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    const { closeDb } = await import('@/db/client');
    const p = await makePerson('restart');
    for (let k = 0; k < 8; k++) await signInWithPassword({ email: p.email, password: 'nope nope', address: '192.0.2.40' });
    await closeDb();
    await expect(signInWithPassword({ email: p.email, password: p.password, address: '192.0.2.41' })).rejects.toMatchObject({ code: 'rate_limited:sign-in' });
  });

  it('never stores the password: only a bcrypt hash', async () => {
    const p = await makePerson('hashed');
    const { getPool } = await import('@/db/client');
    const [rows] = (await getPool().query('SELECT password_hash FROM users WHERE id = ?', [p.id])) as unknown as [{ password_hash: string }[]];
    expect(rows[0].password_hash).toMatch(/^\$2[aby]\$10\$/);
    expect(rows[0].password_hash).not.toContain(p.password);
  });
});
