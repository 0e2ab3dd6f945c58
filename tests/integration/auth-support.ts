// Shared set-up for the auth-* and mail-* integration tests: the real SMTP fake on a free
// loopback port (storing into the test database's dev_mail table), a way to call route
// handlers as a given user, and people to call them as. The session itself is faked in
// each test file with vi.mock('@/lib/auth/session-source') (see tests/authz/README.md).
import { afterAll, beforeAll } from 'vitest';

export interface Claims {
  userId: number;
  sessionVersion: number;
}

/** Starts the SMTP fake before the file's tests and points SMTP_HOST/SMTP_PORT at it. */
export function useMailCatcher() {
  let close: (() => Promise<void>) | null = null;
  const saved = { host: process.env.SMTP_HOST, port: process.env.SMTP_PORT, url: process.env.NEXTAUTH_URL };
  beforeAll(async () => {
    const { startMailCatcher } = await import('@/lib/mail/catcher');
    const { insertDevMail } = await import('@/db/queries/dev-mail');
    const c = await startMailCatcher({ port: 0, store: async (m) => void (await insertDevMail(m)) });
    close = c.close;
    process.env.SMTP_HOST = '127.0.0.1';
    process.env.SMTP_PORT = String(c.port);
    process.env.NEXTAUTH_URL = 'http://127.0.0.1:3000';
  });
  afterAll(async () => {
    await close?.();
    for (const [k, v] of [['SMTP_HOST', saved.host], ['SMTP_PORT', saved.port], ['NEXTAUTH_URL', saved.url]] as const) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  });
  return {
    /** Every captured message to an address, oldest first. */
    async to(email: string) {
      const { getDb } = await import('@/db/client');
      const { devMail } = await import('@/db/schema');
      const { asc, like } = await import('drizzle-orm');
      return getDb().select().from(devMail).where(like(devMail.toAddresses, `%${email}%`)).orderBy(asc(devMail.id));
    },
  };
}

/** The first link in a message's plain-text part that starts with the app's URL and the given path. */
export function linkIn(text: string | null, pathPrefix: string): string {
  const m = (text ?? '').match(new RegExp(`http://127\\.0\\.0\\.1:3000${pathPrefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}[^\\s]+`));
  if (!m) throw new Error(`no ${pathPrefix} link in:\n${text}`);
  return m[0];
}

/** The token at the end of a link (…/invitations/TOKEN or …?token=TOKEN). */
export function tokenOf(link: string): string {
  const u = new URL(link);
  return u.searchParams.get('token') ?? u.pathname.split('/').pop()!;
}

export interface Called {
  status: number;
  json: any; // eslint-disable-line @typescript-eslint/no-explicit-any
}

/**
 * Calls a route handler as `claims` (null: signed out), with a JSON body and same-origin
 * headers like a browser on the app would send (override `origin` to test CSRF).
 */
export async function call(
  session: { claims: Claims | null },
  handler: unknown,
  opts: { url: string; method: string; claims: Claims | null; params?: Record<string, string>; body?: unknown; origin?: string | null; headers?: Record<string, string> },
): Promise<Called> {
  const origin = opts.origin === undefined ? 'http://127.0.0.1:3000' : opts.origin;
  const headers: Record<string, string> = { host: '127.0.0.1:3000', ...(origin ? { origin } : {}), ...opts.headers };
  if (opts.body !== undefined) headers['content-type'] = 'application/json';
  const req = new Request(`http://127.0.0.1:3000${opts.url}`, { method: opts.method, headers, body: opts.body === undefined ? undefined : typeof opts.body === 'string' ? opts.body : JSON.stringify(opts.body) });
  session.claims = opts.claims;
  try {
    const res = await (handler as (r: Request, c: unknown) => Promise<Response>)(req, { params: Promise.resolve(opts.params ?? {}) });
    const text = await res.text();
    return { status: res.status, json: text ? JSON.parse(text) : null };
  } finally {
    session.claims = null;
  }
}

let n = 0;
/** A person with a known password (hashed for real), confirmed unless told otherwise. */
export async function makePerson(label: string, opts: { verified?: boolean; password?: string } = {}) {
  const { insertUser } = await import('@/db/queries/users');
  const { hashPassword } = await import('@/lib/auth/password');
  const password = opts.password ?? 'correct horse battery';
  const email = `${label}-${process.pid}-${++n}@example.org`;
  const id = await insertUser({ email, name: label, passwordHash: await hashPassword(password), emailVerified: opts.verified ?? true });
  return { id, email, name: label, password, claims: { userId: id, sessionVersion: 0 } as Claims };
}
