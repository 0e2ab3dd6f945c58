import { currentUser } from '@/lib/auth/session';
import { assertSameOrigin, readJson, route } from '@/lib/http';
import { acceptInvitation } from '@/lib/labs/invitations';
import { acceptInvitationSchema } from '@/lib/labs/schema';

export const dynamic = 'force-dynamic';

/**
 * Accepts an invitation. The token is the credential: signed in, the account's address must
 * be the invited one; signed out, `name` and `password` create the invited account.
 */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const user = await currentUser();
  const input = await readJson(request, acceptInvitationSchema, 'invitation');
  const newAccount = input.name && input.password ? { name: input.name, password: input.password } : undefined;
  const result = await acceptInvitation({ token: input.token, user, newAccount });
  return Response.json({ lab: { id: result.labId, role: result.role }, email: result.email, newAccount: !user }, { status: 201 });
});
