// Integration: labs and members through the route handlers against real MariaDB — create,
// rename, change roles, remove, leave; a lab always keeps at least one Owner, even when two
// Owners demote each other at the same moment; changes land in the audit trail.
import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { call, makePerson, type Claims } from './auth-support';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();

const labsRoute = () => import('@/app/api/labs/route');
const labRoute = () => import('@/app/api/labs/[labId]/route');
const memberRoute = () => import('@/app/api/labs/[labId]/members/[userId]/route');
const membershipRoute = () => import('@/app/api/labs/[labId]/membership/route');

async function newLab(claims: Claims, name = 'Upstream team') {
  const r = await call(session, (await labsRoute()).POST, { url: '/api/labs', method: 'POST', claims, body: { name } });
  expect(r.status).toBe(201);
  return r.json.lab.id as number;
}
const setRole = async (claims: Claims, labId: number, userId: number, role: string) =>
  call(session, (await memberRoute()).PATCH, { url: `/api/labs/${labId}/members/${userId}`, method: 'PATCH', claims, params: { labId: String(labId), userId: String(userId) }, body: { role } });
const remove = async (claims: Claims, labId: number, userId: number) =>
  call(session, (await memberRoute()).DELETE, { url: `/api/labs/${labId}/members/${userId}`, method: 'DELETE', claims, params: { labId: String(labId), userId: String(userId) } });
const leave = async (claims: Claims, labId: number) => call(session, (await membershipRoute()).DELETE, { url: `/api/labs/${labId}/membership`, method: 'DELETE', claims, params: { labId: String(labId) } });

describe('labs and members', () => {
  it('makes the creator the Owner, lists the lab for them only', async () => {
    const a = await makePerson('creator');
    const b = await makePerson('other');
    const labId = await newLab(a.claims);
    const list = async (c: Claims) => (await call(session, (await labsRoute()).GET, { url: '/api/labs', method: 'GET', claims: c })).json.labs;
    expect(await list(a.claims)).toEqual([{ id: labId, name: 'Upstream team', role: 'owner' }]);
    expect(await list(b.claims)).toEqual([]);
    const peek = await call(session, (await labRoute()).GET, { url: `/api/labs/${labId}`, method: 'GET', claims: b.claims, params: { labId: String(labId) } });
    expect(peek.status).toBe(404);
  });

  it('never leaves a lab without an Owner: the last one cannot be demoted, removed or leave', async () => {
    const owner = await makePerson('only-owner');
    const author = await makePerson('author');
    const labId = await newLab(owner.claims);
    const { addMember } = await import('@/db/queries/labs');
    await addMember(labId, author.id, 'author');

    for (const r of [await setRole(owner.claims, labId, owner.id, 'author'), await remove(owner.claims, labId, owner.id), await leave(owner.claims, labId)]) {
      expect(r.status).toBe(409);
      expect(r.json.error.code).toBe('conflict:last-owner');
      expect(r.json.error.message).toMatch(/at least one Owner/);
    }
    // With a second Owner, the first may step down.
    expect((await setRole(owner.claims, labId, author.id, 'owner')).status).toBe(200);
    expect((await setRole(owner.claims, labId, owner.id, 'reader')).status).toBe(200);
    const { membersOf } = await import('@/db/queries/labs');
    expect((await membersOf(labId)).map((m) => m.role).sort()).toEqual(['owner', 'reader']);
  });

  it('keeps one Owner when two Owners demote each other at the same moment', async () => {
    const a = await makePerson('owner-a');
    const b = await makePerson('owner-b');
    const labId = await newLab(a.claims);
    const { addMember, membersOf } = await import('@/db/queries/labs');
    await addMember(labId, b.id, 'owner');
    const results = await Promise.all([setRole(a.claims, labId, b.id, 'reader'), setRole(b.claims, labId, a.id, 'reader')]);
    const statuses = results.map((r) => r.status).sort();
    // One demotion wins; the other either finds the lab with a single Owner (409) or finds
    // its caller already demoted (403). Never both succeed.
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    expect((await membersOf(labId)).filter((m) => m.role === 'owner')).toHaveLength(1);
  });

  it('lets a member leave and an Owner remove a member; records role changes, removals and departures', async () => {
    const owner = await makePerson('o');
    const r1 = await makePerson('r1');
    const r2 = await makePerson('r2');
    const labId = await newLab(owner.claims);
    const { addMember, membershipOf } = await import('@/db/queries/labs');
    await addMember(labId, r1.id, 'reader');
    await addMember(labId, r2.id, 'reader');
    expect((await setRole(owner.claims, labId, r1.id, 'reviewer')).status).toBe(200);
    expect((await remove(owner.claims, labId, r1.id)).status).toBe(204);
    expect((await leave(r2.claims, labId)).status).toBe(204);
    expect(await membershipOf(r1.id, labId)).toBeUndefined();
    expect(await membershipOf(r2.id, labId)).toBeUndefined();
    // Gone members cannot act or read any more.
    expect((await leave(r2.claims, labId)).status).toBe(404);

    const { listLabAudit } = await import('@/db/queries/audit');
    const events = await listLabAudit(labId, { limit: 10 });
    expect(events.map((e) => [e.action, e.subject, e.detail])).toEqual([
      ['member.left', `user:${r2.id}`, { role: 'reader' }],
      ['member.removed', `user:${r1.id}`, { role: 'reviewer' }],
      ['member.role-changed', `user:${r1.id}`, { from: 'reader', to: 'reviewer' }],
      ['lab.created', `lab:${labId}`, { name: 'Upstream team' }],
    ]);
  });

  it('renames a lab, storing SQL and HTML as text; refuses over-long and empty names naming the field', async () => {
    const owner = await makePerson('renamer');
    const labId = await newLab(owner.claims);
    const name = `<img src=x onerror=alert(1)> '; DELETE FROM labs; --`;
    const ok = await call(session, (await labRoute()).PATCH, { url: `/api/labs/${labId}`, method: 'PATCH', claims: owner.claims, params: { labId: String(labId) }, body: { name } });
    expect(ok.status).toBe(200);
    const { findLab } = await import('@/db/queries/labs');
    expect((await findLab(labId))?.name).toBe(name);
    for (const bad of ['x'.repeat(121), '   ', 42]) {
      const r = await call(session, (await labRoute()).PATCH, { url: `/api/labs/${labId}`, method: 'PATCH', claims: owner.claims, params: { labId: String(labId) }, body: { name: bad } });
      expect(r.status).toBe(422);
      expect(r.json.error.path).toBe('name');
    }
    expect((await findLab(labId))?.name).toBe(name);
  });

  it('answers not-found for malformed ids and for members of another lab', async () => {
    const owner = await makePerson('ids');
    const labId = await newLab(owner.claims);
    const other = await makePerson('elsewhere');
    const otherLab = await newLab(other.claims, 'Elsewhere');
    for (const id of ['abc', '0', '-1', '1.5', '99999999999']) {
      const r = await call(session, (await labRoute()).GET, { url: `/api/labs/${id}`, method: 'GET', claims: owner.claims, params: { labId: id } });
      expect(r.status).toBe(404);
    }
    // An Owner of one lab cannot touch a member of another lab through their own lab's URL.
    const r = await setRole(owner.claims, labId, other.id, 'reader');
    expect(r.status).toBe(404);
    expect(r.json.error.code).toBe('not_found:member');
    const { membershipOf } = await import('@/db/queries/labs');
    expect((await membershipOf(other.id, otherLab))?.role).toBe('owner');
  });
});
