/// <reference types="vite/client" />
/**
 * The authorization matrix: every route handler (app/api/**\/route.ts, every exported
 * method) and every exported server action ('use server' files) is called as each of six
 * actors — anonymous, outsider (a member of another lab only), Reader, Reviewer, Author,
 * Owner — and the set of actors that get a 2xx must equal the row's `allowed` set exactly.
 * A route, method or action without a row fails the test; so does a row for a route that
 * no longer exists.
 *
 * Rows live in tests/authz/<area>.ts (one file per area, loaded by glob; files starting
 * with "_" are helpers). Each file default-exports an array of rows:
 *
 *   { method: 'POST', path: '/api/labs/[labId]/datasets',
 *     name?: 'upload a CSV',                               // tells several rows of one route apart
 *     request?: async (f) => ({ params: { labId: String(f.labId) }, body: {...}, query?, headers? }),
 *     allowed: ['author', 'owner'],                         // exactly who gets a 2xx
 *     refused?: [401, 403, 404, 409],                       // statuses a refused actor may get
 *     csrfExempt?: 'reason',                                // skip the foreign-Origin check
 *     exempt?: 'reason' }                                   // do not call at all
 *
 *   { action: 'app/labs/[labId]/memos/actions.ts#createMemo',
 *     call: (fn, f) => fn(...args built from f), allowed: [...] }
 *
 * `f` is a fresh fixture for every call (see tests/authz/_kit.ts): a lab with one member per
 * role, another lab owned by the outsider, all addresses confirmed, all passwords known.
 * Each call gets its own fixture, so a call that changes things never affects the next.
 *
 * Checks per row: no call answers 5xx; refused actors get one of `refused`; and each
 * non-GET row is sent once more as its first allowed actor with `Origin: https://elsewhere.example`
 * and must get 403 (the CSRF Origin check of lib/http.ts `assertSameOrigin`).
 *
 * The session is faked at one seam: lib/auth/session-source.ts is replaced by vi.mock below,
 * so `currentUser()` still loads the account from the database as in production.
 * Server actions: a call counts as refused when it throws an AppError of kind unauthorized,
 * forbidden or not_found, calls notFound()/forbidden()/unauthorized(), redirects to /sign-in,
 * or returns an object whose `error.code` (or `code`) has one of those kinds.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { ACTORS, type Actor, type ActionRow, type AuthzRow, type Fixture, type Method, type Person, type RouteRow } from '../authz/_kit';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));
vi.mock('next/cache', async (importOriginal) => ({
  ...(await importOriginal<Record<string, unknown>>()),
  revalidatePath: () => {},
  revalidateTag: () => {},
  updateTag: () => {},
  refresh: () => {},
}));

useTestDatabase();

const ROOT = process.cwd();
const METHODS: Method[] = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'];
const ORIGIN = 'http://127.0.0.1:3000';
const PASSWORD = 'matrix-password-1';
const DEFAULT_REFUSED = [401, 403, 404, 409];

const tables = import.meta.glob<{ default: AuthzRow[] }>(['../authz/*.ts', '!../authz/_*.ts'], { eager: true });
const rows: (AuthzRow & { file: string })[] = Object.entries(tables).flatMap(([file, mod]) => (mod.default ?? []).map((r) => ({ ...r, file: path.basename(file) })));
const routeRows = rows.filter((r): r is RouteRow & { file: string } => 'method' in r);
const actionRows = rows.filter((r): r is ActionRow & { file: string } => 'action' in r);

function walk(dir: string): string[] {
  let out: string[] = [];
  for (const name of readdirSync(dir)) {
    if (name === 'node_modules' || name.startsWith('.')) continue;
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) out = out.concat(walk(p));
    else out.push(p);
  }
  return out;
}

/** Every app/api/**\/route.ts as a path pattern, e.g. /api/labs/[labId]/members. */
function discoverRoutes(): { pattern: string; file: string }[] {
  return walk(path.join(ROOT, 'app', 'api'))
    .filter((f) => /[/\\]route\.tsx?$/.test(f))
    .map((file) => {
      const rel = path.relative(path.join(ROOT, 'app'), path.dirname(file)).split(path.sep);
      // Route groups "(name)" do not appear in URLs.
      return { pattern: '/' + rel.filter((s) => !/^\(.*\)$/.test(s)).join('/'), file };
    });
}

/** Files whose first statement is 'use server', with their exported names; and files with inline 'use server'. */
function discoverActions(): { actions: { id: string; file: string; name: string }[]; inline: string[] } {
  const actions: { id: string; file: string; name: string }[] = [];
  const inline: string[] = [];
  for (const dir of ['app', 'components', 'lib', 'blocks']) {
    let files: string[] = [];
    try {
      files = walk(path.join(ROOT, dir)).filter((f) => /\.(ts|tsx)$/.test(f) && !/\.test\.tsx?$/.test(f));
    } catch {
      continue;
    }
    for (const file of files) {
      const text = readFileSync(file, 'utf8');
      if (!/['"]use server['"]/.test(text)) continue;
      const rel = path.relative(ROOT, file).split(path.sep).join('/');
      const body = text.replace(/^(\s*(\/\/[^\n]*\n|\/\*[\s\S]*?\*\/))*/, '');
      if (!/^\s*['"]use server['"]/.test(body)) {
        inline.push(rel);
        continue;
      }
      const names = new Set<string>();
      for (const m of text.matchAll(/export\s+(?:async\s+)?function\s+(\w+)/g)) names.add(m[1]);
      for (const m of text.matchAll(/export\s+const\s+(\w+)/g)) names.add(m[1]);
      for (const m of text.matchAll(/export\s*\{([^}]*)\}/g)) for (const n of m[1].split(',')) if (n.trim()) names.add(n.trim().split(/\s+as\s+/).pop()!);
      for (const name of names) actions.push({ id: `${rel}#${name}`, file, name });
    }
  }
  return { actions, inline };
}

// ---- fixtures -------------------------------------------------------------------------

let passwordHash = '';
let counter = 0;

async function makeFixture(actor: Actor): Promise<Fixture> {
  const { insertUser } = await import('@/db/queries/users');
  const { createLab, addMember } = await import('@/db/queries/labs');
  const unique = `${process.pid}-${++counter}-${Math.random().toString(36).slice(2, 8)}`;
  const people = {} as Fixture['people'];
  for (const who of ['owner', 'author', 'reviewer', 'reader', 'outsider'] as const) {
    const email = `${who}-${unique}@matrix.example`;
    const name = `${who[0].toUpperCase()}${who.slice(1)} ${unique}`;
    const id = await insertUser({ email, name, passwordHash, emailVerified: true });
    people[who] = { id, email, name, password: PASSWORD };
  }
  const labId = await createLab(`Matrix lab ${unique}`, people.owner.id);
  for (const role of ['author', 'reviewer', 'reader'] as const) await addMember(labId, people[role].id, role);
  const otherLabId = await createLab(`Other lab ${unique}`, people.outsider.id);
  const me: Person | null = actor === 'anonymous' ? null : people[actor];
  return { actor, me, labId, otherLabId, people, unique };
}

function signInAs(f: Fixture) {
  session.claims = f.me ? { userId: f.me.id, sessionVersion: 0 } : null;
}

// ---- calling --------------------------------------------------------------------------

const modules = new Map<string, Record<string, unknown>>();
async function routeModule(pattern: string) {
  const found = discoverRoutes().find((r) => r.pattern === pattern);
  if (!found) throw new Error(`no route file for ${pattern}`);
  if (!modules.has(found.file)) modules.set(found.file, await import(/* @vite-ignore */ found.file));
  return modules.get(found.file)!;
}

async function callRoute(row: RouteRow, f: Fixture, extraHeaders: Record<string, string> = {}): Promise<{ status: number; body: string }> {
  const spec = (await row.request?.(f)) ?? {};
  const params = spec.params ?? {};
  let urlPath = row.path.replace(/\[\.{3}(\w+)\]|\[(\w+)\]/g, (_, rest, one) => encodeURIComponent(params[rest ?? one] ?? 'missing'));
  if (spec.query) urlPath += `?${new URLSearchParams(spec.query)}`;
  const headers: Record<string, string> = { host: '127.0.0.1:3000', ...(spec.body !== undefined ? { 'content-type': 'application/json' } : {}), ...spec.headers, ...extraHeaders };
  const request = new Request(`${ORIGIN}${urlPath}`, { method: row.method, headers, body: spec.body !== undefined ? JSON.stringify(spec.body) : undefined });
  const handler = (await routeModule(row.path))[row.method] as (r: Request, c: unknown) => Promise<Response>;
  signInAs(f);
  try {
    const res = await handler(request, { params: Promise.resolve(params) });
    return { status: res.status, body: await res.text() };
  } finally {
    session.claims = null;
  }
}

const REFUSED_KINDS = /^(unauthorized|forbidden|not_found):/;

async function callAction(row: ActionRow, f: Fixture): Promise<'allowed' | 'refused'> {
  const [file, name] = row.action.split('#');
  const mod = (await import(/* @vite-ignore */ path.join(ROOT, file))) as Record<string, unknown>;
  const fn = mod[name] as (...args: never[]) => Promise<unknown>;
  if (typeof fn !== 'function') throw new Error(`${row.action} is not an exported function`);
  signInAs(f);
  try {
    const result = row.call ? await row.call(fn, f) : await fn();
    const code = (result as { error?: { code?: string }; code?: string } | null)?.error?.code ?? (result as { code?: string } | null)?.code;
    return typeof code === 'string' && REFUSED_KINDS.test(code) ? 'refused' : 'allowed';
  } catch (e) {
    const err = e as { code?: string; digest?: string; name?: string };
    if (err?.name === 'AppError' && REFUSED_KINDS.test(err.code ?? '')) return 'refused';
    if (typeof err?.digest === 'string') {
      if (/^NEXT_HTTP_ERROR_FALLBACK;(401|403|404)/.test(err.digest)) return 'refused';
      if (err.digest.startsWith('NEXT_REDIRECT')) return err.digest.includes('/sign-in') ? 'refused' : 'allowed';
    }
    throw e;
  } finally {
    session.claims = null;
  }
}

// ---- the test -------------------------------------------------------------------------

let mail: { close: () => Promise<void> } | null = null;
const saved = { host: process.env.SMTP_HOST, port: process.env.SMTP_PORT };

beforeAll(async () => {
  const { hashPassword } = await import('@/lib/auth/password');
  passwordHash = await hashPassword(PASSWORD);
  // Routes that send mail (invitations, verification, reset) talk to the real SMTP fake.
  const { startMailCatcher } = await import('@/lib/mail/catcher');
  const { insertDevMail } = await import('@/db/queries/dev-mail');
  const catcher = await startMailCatcher({ port: 0, store: async (m) => void (await insertDevMail(m)) });
  mail = catcher;
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(catcher.port);
});

afterAll(async () => {
  await mail?.close();
  process.env.SMTP_HOST = saved.host;
  process.env.SMTP_PORT = saved.port;
  if (saved.host === undefined) delete process.env.SMTP_HOST;
  if (saved.port === undefined) delete process.env.SMTP_PORT;
});

describe('authorization matrix: coverage', () => {
  it('has a row for every route handler method under app/api', async () => {
    const missing: string[] = [];
    for (const r of discoverRoutes()) {
      const mod = await routeModule(r.pattern);
      for (const m of METHODS) {
        if (typeof mod[m] === 'function' && !routeRows.some((row) => row.method === m && row.path === r.pattern)) missing.push(`${m} ${r.pattern}`);
      }
    }
    expect(missing, `add rows to a file in tests/authz/ for: ${missing.join(', ')}`).toEqual([]);
  });

  it('has no row for a route or method that does not exist', async () => {
    const patterns = new Set(discoverRoutes().map((r) => r.pattern));
    const stale: string[] = [];
    for (const row of routeRows) {
      if (!patterns.has(row.path)) stale.push(`${row.method} ${row.path} (${row.file})`);
      else if (typeof (await routeModule(row.path))[row.method] !== 'function') stale.push(`${row.method} ${row.path} (${row.file})`);
    }
    expect(stale).toEqual([]);
  });

  it("has a row for every exported server action, and no inline 'use server' the scan cannot see", () => {
    const { actions, inline } = discoverActions();
    expect(inline, `move inline 'use server' functions into a file that starts with 'use server': ${inline.join(', ')}`).toEqual([]);
    const missing = actions.filter((a) => !actionRows.some((r) => r.action === a.id)).map((a) => a.id);
    expect(missing, `add action rows to tests/authz/ for: ${missing.join(', ')}`).toEqual([]);
    const stale = actionRows.filter((r) => !actions.some((a) => a.id === r.action)).map((r) => r.action);
    expect(stale).toEqual([]);
  });

  it('gives every exempt row a reason and every row a known actor list', () => {
    for (const row of rows) {
      if ('exempt' in row && row.exempt !== undefined) expect(row.exempt.length).toBeGreaterThan(10);
      for (const a of row.allowed) expect(ACTORS).toContain(a);
    }
  });
});

describe('authorization matrix: who gets a 2xx', () => {
  const callable = routeRows.filter((r) => !r.exempt);
  it.each(callable.map((r) => [`${r.method} ${r.path}${r.name ? ` — ${r.name}` : ''} (${r.file})`, r] as const))('%s', async (_label, row) => {
    const got: Actor[] = [];
    const problems: string[] = [];
    for (const actor of ACTORS) {
      const f = await makeFixture(actor);
      const { status, body } = await callRoute(row, f);
      if (status >= 500) problems.push(`${actor}: ${status} ${body.slice(0, 200)}`);
      if (status >= 200 && status < 300) got.push(actor);
      else if (!row.allowed.includes(actor) && !(row.refused ?? DEFAULT_REFUSED).includes(status)) problems.push(`${actor}: refused with unexpected ${status} ${body.slice(0, 200)}`);
      else if (row.allowed.includes(actor)) problems.push(`${actor}: expected 2xx, got ${status} ${body.slice(0, 200)}`);
    }
    expect(problems).toEqual([]);
    expect(got).toEqual(ACTORS.filter((a) => row.allowed.includes(a)));
  });

  const csrf = callable.filter((r) => r.method !== 'GET' && r.allowed.length > 0 && !r.csrfExempt);
  it.each(csrf.map((r) => [`${r.method} ${r.path}${r.name ? ` — ${r.name}` : ''}`, r] as const))('refuses %s from a foreign Origin', async (_label, row) => {
    const f = await makeFixture(row.allowed[0]);
    const { status, body } = await callRoute(row, f, { origin: 'https://elsewhere.example' });
    expect(status).toBe(403);
    expect(JSON.parse(body).error.code).toBe('forbidden:origin');
  });

  const actions = actionRows.filter((r) => !r.exempt);
  it.each(actions.map((r) => [`${r.action}${r.name ? ` — ${r.name}` : ''}`, r] as const))('server action %s', async (_label, row) => {
    const got: Actor[] = [];
    for (const actor of ACTORS) if ((await callAction(row, await makeFixture(actor))) === 'allowed') got.push(actor);
    expect(got).toEqual(ACTORS.filter((a) => row.allowed.includes(a)));
  });
});
