import { resendVerification } from '@/lib/accounts/profile';
import { requireUser } from '@/lib/auth/session';
import { assertSameOrigin, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** Mails the signed-in user a fresh link to confirm their address. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const user = await requireUser();
  await resendVerification(user.id);
  return Response.json({ ok: true, message: `We sent a new confirmation link to ${user.email}.` }, { status: 202 });
});
