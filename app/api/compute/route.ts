import { requireUser } from '@/lib/auth/session';
import { compute } from '@/lib/compute';
import { AppError } from '@/lib/errors';
import { assertSameOrigin, route } from '@/lib/http';
import { parseRequest } from '@/lib/resampling';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/**
 * POST /api/compute — runs one engine request for a signed-in user and answers the engine's
 * response, the same JSON as `npm run -s compute`. It reads no stored data, so there is no
 * row to authorize beyond the session. 400 when the body is not JSON; 422 with
 * { error: { code, message, path } } naming the field when the request is invalid or over a
 * limit. The computation stops when the client goes away (request.signal).
 */
export const POST = route(async (request) => {
  assertSameOrigin(request);
  await requireUser();
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new AppError('bad_request:json', 'The request body is not valid JSON.');
  }
  const engineRequest = parseRequest(body);
  const result = await compute(engineRequest, { signal: request.signal });
  return Response.json(result, { headers: { 'cache-control': 'no-store' } });
});
