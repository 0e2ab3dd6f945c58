// Authorization rows: labs, members, invitations (Owner side) and the audit trail.
import { invitationFor, MEMBERS, NOBODY, OWNERS, SIGNED_IN, sql, type AuthzRow } from './_kit';

export default [
  { method: 'GET', path: '/api/labs', allowed: SIGNED_IN },
  { method: 'POST', path: '/api/labs', request: (f) => ({ body: { name: `Lab ${f.unique}` } }), allowed: SIGNED_IN },
  { method: 'GET', path: '/api/labs/[labId]', request: (f) => ({ params: { labId: String(f.labId) } }), allowed: MEMBERS },
  { method: 'PATCH', path: '/api/labs/[labId]', request: (f) => ({ params: { labId: String(f.labId) }, body: { name: 'Renamed lab' } }), allowed: OWNERS },
  { method: 'GET', path: '/api/labs/[labId]/members', request: (f) => ({ params: { labId: String(f.labId) } }), allowed: MEMBERS },
  {
    method: 'PATCH',
    path: '/api/labs/[labId]/members/[userId]',
    name: 'make the Reader an Author',
    request: (f) => ({ params: { labId: String(f.labId), userId: String(f.people.reader.id) }, body: { role: 'author' } }),
    allowed: OWNERS,
  },
  {
    method: 'PATCH',
    path: '/api/labs/[labId]/members/[userId]',
    name: 'demote the only Owner (nobody may: last Owner)',
    request: (f) => ({ params: { labId: String(f.labId), userId: String(f.people.owner.id) }, body: { role: 'reader' } }),
    allowed: NOBODY,
  },
  {
    method: 'DELETE',
    path: '/api/labs/[labId]/members/[userId]',
    name: 'remove the Reader',
    request: (f) => ({ params: { labId: String(f.labId), userId: String(f.people.reader.id) } }),
    allowed: OWNERS,
  },
  {
    method: 'DELETE',
    path: '/api/labs/[labId]/membership',
    name: 'leave the lab (its only Owner may not: last Owner)',
    request: (f) => ({ params: { labId: String(f.labId) } }),
    allowed: ['reader', 'reviewer', 'author'],
  },
  {
    method: 'DELETE',
    path: '/api/labs/[labId]/membership',
    name: 'leave the lab when it has a second Owner',
    request: async (f) => {
      await sql("UPDATE memberships SET role = 'owner' WHERE lab_id = ? AND user_id = ?", [f.labId, f.people.author.id]);
      return { params: { labId: String(f.labId) } };
    },
    allowed: MEMBERS,
  },
  { method: 'GET', path: '/api/labs/[labId]/invitations', request: (f) => ({ params: { labId: String(f.labId) } }), allowed: OWNERS },
  {
    method: 'POST',
    path: '/api/labs/[labId]/invitations',
    request: (f) => ({ params: { labId: String(f.labId) }, body: { email: `colleague-${f.unique}@example.org`, role: 'reviewer' } }),
    allowed: OWNERS,
  },
  {
    method: 'DELETE',
    path: '/api/labs/[labId]/invitations/[invitationId]',
    request: async (f) => {
      const inv = await invitationFor(f.labId, `pending-${f.unique}@example.org`, f.people.owner.id);
      return { params: { labId: String(f.labId), invitationId: String(inv.id) } };
    },
    allowed: OWNERS,
  },
  { method: 'GET', path: '/api/labs/[labId]/audit', request: (f) => ({ params: { labId: String(f.labId) } }), allowed: OWNERS },
] satisfies AuthzRow[];
