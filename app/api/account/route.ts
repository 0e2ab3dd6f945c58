import { labsForUser } from '@/db/queries/labs';
import { renameAccount } from '@/lib/accounts/profile';
import { profileSchema, signUpSchema } from '@/lib/accounts/schema';
import { signUp } from '@/lib/accounts/sign-up';
import { clientAddress } from '@/lib/auth/client-address';
import { requireUser } from '@/lib/auth/session';
import { assertSameOrigin, readJson, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** The signed-in account and its labs. */
export const GET = route(async () => {
  const user = await requireUser();
  return Response.json({ user, labs: await labsForUser(user.id) });
});

/** Sign-up: creates an account and mails a verification link. Open to anyone. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const input = await readJson(request, signUpSchema, 'account');
  const { userId, mailSent } = await signUp(input, clientAddress(request.headers));
  return Response.json({ user: { id: userId, email: input.email, name: input.name }, verificationMailSent: mailSent }, { status: 201 });
});

/** Changes the account's display name. */
export const PATCH = route(async (request) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const input = await readJson(request, profileSchema, 'account');
  await renameAccount(user.id, input.name);
  return Response.json({ user: { ...user, name: input.name } });
});
