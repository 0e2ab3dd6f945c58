import { verifySchema } from '@/lib/accounts/schema';
import { confirmVerification } from '@/lib/accounts/verification';
import { assertSameOrigin, readJson, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** Uses a mailed confirmation link. The token is the credential, so no session is needed. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const input = await readJson(request, verifySchema, 'token');
  await confirmVerification(input.token);
  return Response.json({ ok: true, message: 'Your e-mail address is confirmed.' });
});
