// Integration: the whole invitation flow against the real MariaDB test instance and the real
// SMTP fake — an Owner invites, the mail arrives with a link, the invitee accepts as a new
// or an existing account; expiry, revocation, reuse and the wrong address are refused.
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { call, linkIn, makePerson, tokenOf, useMailCatcher, type Claims } from './auth-support';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();
const mail = useMailCatcher();

const invitations = () => import('@/app/api/labs/[labId]/invitations/route');
const accept = () => import('@/app/api/invitations/accept/route');

async function labOwnedBy(owner: { id: number }, name = 'Estuary nitrate survey') {
  const { createLabFor } = await import('@/lib/labs/labs');
  return (await createLabFor(owner.id, name)).id;
}

async function invite(ownerClaims: Claims, labId: number, email: string, role = 'reviewer') {
  return call(session, (await invitations()).POST, { url: `/api/labs/${labId}/invitations`, method: 'POST', claims: ownerClaims, params: { labId: String(labId) }, body: { email, role } });
}

describe('invitations', () => {
  it('mails a link that lets a new address create its account and join with the invited role, once', async () => {
    const owner = await makePerson('owner');
    const labId = await labOwnedBy(owner);
    const email = `new-colleague-${process.pid}@example.org`;
    const sent = await invite(owner.claims, labId, email.toUpperCase(), 'reviewer');
    expect(sent.status).toBe(201);
    expect(sent.json.invitation.email).toBe(email);

    const [message] = await mail.to(email);
    expect(message.subject).toContain('Estuary nitrate survey');
    expect(message.text).toContain('Reviewer');
    expect(message.html).toContain('Accept the invitation');
    const link = linkIn(message.text, '/invitations/');
    const token = tokenOf(link);
    // The database holds only the hash of the token (SHA-256 hex), never the token itself.
    const { getPool } = await import('@/db/client');
    const [rows] = (await getPool().query('SELECT token_hash FROM invitations WHERE email = ?', [email])) as unknown as [{ token_hash: string }[]];
    const { createHash } = await import('node:crypto');
    expect(rows[0].token_hash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(rows)).not.toContain(token);

    const ok = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token, name: 'Mara Quill', password: 'a fine long password' } });
    expect(ok.status).toBe(201);
    expect(ok.json.lab).toEqual({ id: labId, role: 'reviewer' });

    const { findUserByEmail } = await import('@/db/queries/users');
    const created = await findUserByEmail(email);
    expect(created?.emailVerified).toBe(true);
    const { membershipOf } = await import('@/db/queries/labs');
    expect((await membershipOf(created!.id, labId))?.role).toBe('reviewer');
    // The new account signs in with the password it chose.
    const { signInWithPassword } = await import('@/lib/auth/sign-in');
    expect((await signInWithPassword({ email, password: 'a fine long password', address: '192.0.2.10' }))?.id).toBe(created!.id);

    const again = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token, name: 'Someone Else', password: 'another long password' } });
    expect(again.status).toBe(409);
    expect(again.json.error.message).toMatch(/already been used/);
  });

  it('lets an existing account accept when signed in with the invited address, and refuses any other account', async () => {
    const owner = await makePerson('owner2');
    const invitee = await makePerson('invitee', { verified: false });
    const stranger = await makePerson('stranger');
    const labId = await labOwnedBy(owner);
    expect((await invite(owner.claims, labId, invitee.email, 'author')).status).toBe(201);
    const token = tokenOf(linkIn((await mail.to(invitee.email))[0].text, '/invitations/'));

    const wrong = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: stranger.claims, body: { token } });
    expect(wrong.status).toBe(403);
    expect(wrong.json.error.message).toContain(invitee.email);

    // Signed out with an existing account for the address: must sign in first.
    const signedOut = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token, name: 'Impostor', password: 'a fine long password' } });
    expect(signedOut.status).toBe(409);
    expect(signedOut.json.error.code).toBe('conflict:account');

    const ok = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: invitee.claims, body: { token } });
    expect(ok.status).toBe(201);
    expect(ok.json.lab.role).toBe('author');
    const { findUserById } = await import('@/db/queries/users');
    expect((await findUserById(invitee.id))?.emailVerified).toBe(true);
  });

  it('refuses an expired invitation and a revoked one', async () => {
    const owner = await makePerson('owner3');
    const labId = await labOwnedBy(owner);
    const a = `late-${process.pid}@example.org`;
    const b = `withdrawn-${process.pid}@example.org`;
    await invite(owner.claims, labId, a);
    const sentB = await invite(owner.claims, labId, b);
    const tokenA = tokenOf(linkIn((await mail.to(a))[0].text, '/invitations/'));
    const tokenB = tokenOf(linkIn((await mail.to(b))[0].text, '/invitations/'));

    const { getPool } = await import('@/db/client');
    await getPool().query('UPDATE invitations SET expires_at = ? WHERE email = ?', [new Date(Date.now() - 1000), a]);
    const expired = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token: tokenA, name: 'Late', password: 'a fine long password' } });
    expect(expired.status).toBe(422);
    expect(expired.json.error.message).toMatch(/expired/);

    const revoke = await import('@/app/api/labs/[labId]/invitations/[invitationId]/route');
    const r = await call(session, revoke.DELETE, {
      url: `/api/labs/${labId}/invitations/${sentB.json.invitation.id}`,
      method: 'DELETE',
      claims: owner.claims,
      params: { labId: String(labId), invitationId: String(sentB.json.invitation.id) },
    });
    expect(r.status).toBe(204);
    const revoked = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token: tokenB, name: 'Withdrawn', password: 'a fine long password' } });
    expect(revoked.status).toBe(422);
    expect(revoked.json.error.message).toMatch(/withdrawn/);

    const { findUserByEmail } = await import('@/db/queries/users');
    expect(await findUserByEmail(a)).toBeUndefined();
    expect(await findUserByEmail(b)).toBeUndefined();
  });

  it('replaces a pending invitation when the same address is invited again: the old link stops working', async () => {
    const owner = await makePerson('owner4');
    const labId = await labOwnedBy(owner);
    const email = `twice-${process.pid}@example.org`;
    await invite(owner.claims, labId, email, 'reader');
    await invite(owner.claims, labId, email, 'author');
    const [first, second] = await mail.to(email);
    const old = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token: tokenOf(linkIn(first.text, '/invitations/')), name: 'Twice', password: 'a fine long password' } });
    expect(old.status).toBe(422);
    const fresh = await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token: tokenOf(linkIn(second.text, '/invitations/')), name: 'Twice', password: 'a fine long password' } });
    expect(fresh.status).toBe(201);
    expect(fresh.json.lab.role).toBe('author');
  });

  it('refuses to invite a current member, and refuses an Owner whose own address is not confirmed', async () => {
    const owner = await makePerson('owner5');
    const labId = await labOwnedBy(owner);
    const member = await invite(owner.claims, labId, owner.email);
    expect(member.status).toBe(409);
    expect(member.json.error.path).toBe('email');

    const unconfirmed = await makePerson('owner6', { verified: false });
    const lab2 = await labOwnedBy(unconfirmed);
    const refused = await invite(unconfirmed.claims, lab2, `someone-${process.pid}@example.org`);
    expect(refused.status).toBe(403);
    expect(refused.json.error.code).toBe('forbidden:verification');
  });

  it('refuses malformed addresses and unknown roles with the field named, and sends no mail', async () => {
    const owner = await makePerson('owner7');
    const labId = await labOwnedBy(owner);
    for (const [body, path] of [
      [{ email: 'not an address', role: 'reader' }, 'email'],
      [{ email: 'a@b', role: 'reader' }, 'email'],
      [{ email: `${'x'.repeat(250)}@example.org`, role: 'reader' }, 'email'],
      [{ email: 'ok@example.org', role: 'admin' }, 'role'],
    ] as const) {
      const r = await call(session, (await invitations()).POST, { url: `/api/labs/${labId}/invitations`, method: 'POST', claims: owner.claims, params: { labId: String(labId) }, body });
      expect(r.status).toBe(422);
      expect(r.json.error.path).toBe(path);
    }
    expect(await mail.to('ok@example.org')).toEqual([]);
  });

  it('escapes HTML in the lab and inviter names in the mail, and keeps them as typed in the database', async () => {
    const owner = await makePerson('<img src=x onerror=alert(1)>');
    const labId = await labOwnedBy(owner, `<script>alert("lab")</script>'; DROP TABLE labs; --`);
    const email = `escaped-${process.pid}@example.org`;
    expect((await invite(owner.claims, labId, email)).status).toBe(201);
    const [m] = await mail.to(email);
    expect(m.html).not.toContain('<script>');
    expect(m.html).not.toContain('<img');
    expect(m.html).toContain('&lt;script&gt;alert(&quot;lab&quot;)&lt;/script&gt;');
    expect(m.text).toContain(`<script>alert("lab")</script>'; DROP TABLE labs; --`);
    const { findLab } = await import('@/db/queries/labs');
    expect((await findLab(labId))?.name).toBe(`<script>alert("lab")</script>'; DROP TABLE labs; --`);
  });

  it('records sent and accepted invitations in the audit trail, readable by the Owner', async () => {
    const owner = await makePerson('owner8');
    const labId = await labOwnedBy(owner);
    const email = `audited-${process.pid}@example.org`;
    await invite(owner.claims, labId, email, 'reader');
    const token = tokenOf(linkIn((await mail.to(email))[0].text, '/invitations/'));
    await call(session, (await accept()).POST, { url: '/api/invitations/accept', method: 'POST', claims: null, body: { token, name: 'Audited', password: 'a fine long password' } });
    const audit = await import('@/app/api/labs/[labId]/audit/route');
    const r = await call(session, audit.GET, { url: `/api/labs/${labId}/audit`, method: 'GET', claims: owner.claims, params: { labId: String(labId) } });
    expect(r.status).toBe(200);
    expect(r.json.events.map((e: { action: string }) => e.action)).toEqual(['invitation.accepted', 'invitation.sent', 'lab.created']);
    expect(JSON.stringify(r.json)).not.toContain(token);
  });
});
