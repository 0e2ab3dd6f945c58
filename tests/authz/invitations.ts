// Authorization rows: accepting an invitation (the link's token is the credential, bound to one address).
import { invitationFor, type AuthzRow } from './_kit';

export default [
  {
    method: 'POST',
    path: '/api/invitations/accept',
    name: 'invitation for a new address, accepted with a new name and password',
    request: async (f) => {
      const inv = await invitationFor(f.labId, `invitee-${f.unique}@example.org`, f.people.owner.id);
      return { body: { token: inv.token, name: 'New Colleague', password: 'a long enough password' } };
    },
    // Signed-in callers have another address (403); anonymous creates the invited account.
    allowed: ['anonymous'],
  },
  {
    method: 'POST',
    path: '/api/invitations/accept',
    name: "invitation addressed to the caller's own account",
    request: async (f) => {
      const inv = await invitationFor(f.labId, f.me?.email ?? `nobody-${f.unique}@example.org`, f.people.owner.id);
      return { body: { token: inv.token } };
    },
    // Members are already in the lab (409); anonymous has no account and no password (401).
    allowed: ['outsider'],
  },
] satisfies AuthzRow[];
