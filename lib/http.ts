import 'server-only';
import type { z } from 'zod';
import { AppError } from './errors';
import { parseWith } from './validation';

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler: AppErrors become `{ error: { code, message, path } }` with their
 * status; anything else is logged and answered with a generic 500 (never a stack trace,
 * never a database message).
 */
export function route<C = unknown>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (e) {
      if (e instanceof AppError) return Response.json(e.toJSON(), { status: e.status });
      // Engine errors carry code/message/path too; they are always the caller's bad input.
      if (e && typeof e === 'object' && (e as { name?: string }).name === 'EngineError') {
        const err = e as unknown as { code: string; message: string; path: string };
        return Response.json({ error: { code: err.code, message: err.message, path: err.path ?? '' } }, { status: 422 });
      }
      console.error('[margin] unhandled error in route', request.method, new URL(request.url).pathname, e);
      return Response.json({ error: { code: 'internal:server', message: 'Something went wrong on the server. Please try again.', path: '' } }, { status: 500 });
    }
  };
}

/** Reads a JSON body: 400 when it is not JSON, 422 (naming the field) when the schema rejects it. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S, subject: string): Promise<z.infer<S>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new AppError(`bad_request:${subject}`, 'The request body is not valid JSON.');
  }
  return parseWith(schema, body, subject);
}

/**
 * CSRF defence for our own state-changing routes: the browser's Origin (or Referer) must be
 * this app's origin. Requests without either header (command-line clients) are allowed,
 * since they cannot carry a victim's cookies from another site.
 */
export function assertSameOrigin(request: Request): void {
  if (['GET', 'HEAD', 'OPTIONS'].includes(request.method)) return;
  const origin = request.headers.get('origin') ?? (request.headers.get('referer') ? new URL(request.headers.get('referer')!).origin : null);
  if (!origin) return;
  const host = request.headers.get('x-forwarded-host') ?? request.headers.get('host');
  const allowed = new Set<string>();
  if (host) {
    allowed.add(`http://${host}`);
    allowed.add(`https://${host}`);
  }
  if (process.env.NEXTAUTH_URL) allowed.add(new URL(process.env.NEXTAUTH_URL).origin);
  if (!allowed.has(origin)) throw new AppError('forbidden:origin', 'This request came from another site and was refused.');
}
