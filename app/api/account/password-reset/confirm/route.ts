import { confirmPasswordReset } from '@/lib/accounts/password-reset';
import { resetConfirmSchema } from '@/lib/accounts/schema';
import { clientAddress } from '@/lib/auth/client-address';
import { assertSameOrigin, readJson, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** Uses a reset link to set a new password. The token is the credential. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const input = await readJson(request, resetConfirmSchema, 'password-reset');
  await confirmPasswordReset(input.token, input.password, clientAddress(request.headers));
  return Response.json({ ok: true, message: 'Your password is changed. Sign in with the new one.' });
});
