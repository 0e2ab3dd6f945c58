import { requestPasswordReset } from '@/lib/accounts/password-reset';
import { resetRequestSchema } from '@/lib/accounts/schema';
import { clientAddress } from '@/lib/auth/client-address';
import { assertSameOrigin, readJson, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** Asks for a reset link. Same answer whether or not the address has an account. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const input = await readJson(request, resetRequestSchema, 'password-reset');
  await requestPasswordReset(input.email, clientAddress(request.headers));
  return Response.json({ ok: true, message: `If ${input.email} has a Margin account, a reset link is on its way. It works for one hour.` }, { status: 202 });
});
