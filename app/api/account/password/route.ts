import { changePassword } from '@/lib/accounts/profile';
import { changePasswordSchema } from '@/lib/accounts/schema';
import { requireUser } from '@/lib/auth/session';
import { assertSameOrigin, readJson, route } from '@/lib/http';

export const dynamic = 'force-dynamic';

/** Changes the password (current one required); every session ends, the client signs in again. */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  const user = await requireUser();
  const input = await readJson(request, changePasswordSchema, 'password');
  await changePassword(user.id, input.currentPassword, input.newPassword);
  return Response.json({ ok: true });
});
