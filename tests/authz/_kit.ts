// Types and helpers for the authorization matrix (tests/integration/authorization-matrix.test.ts).
// Files in tests/authz/ whose name starts with "_" are helpers, not tables. See README.md.
import { getPool } from '@/db/client';
import { insertAuthToken } from '@/db/queries/auth-tokens';
import { insertInvitation } from '@/db/queries/invitations';
import type { Role, TokenPurpose } from '@/db/schema';
import { newToken } from '@/lib/auth/tokens';

/** Who calls: nobody signed in, a member of another lab only, or a member of the fixture lab with that role. */
export const ACTORS = ['anonymous', 'outsider', 'reader', 'reviewer', 'author', 'owner'] as const;
export type Actor = (typeof ACTORS)[number];
export type Person = { id: number; email: string; name: string; password: string };

/** Common allowed sets. */
export const EVERYONE: readonly Actor[] = ACTORS;
export const SIGNED_IN: readonly Actor[] = ['outsider', 'reader', 'reviewer', 'author', 'owner'];
export const MEMBERS: readonly Actor[] = ['reader', 'reviewer', 'author', 'owner'];
export const REVIEWERS_UP: readonly Actor[] = ['reviewer', 'author', 'owner'];
export const AUTHORS_UP: readonly Actor[] = ['author', 'owner'];
export const OWNERS: readonly Actor[] = ['owner'];
export const NOBODY: readonly Actor[] = [];

/**
 * A fresh world for every single call: lab `labId` with one member per role (the Owner is
 * its only Owner), and `otherLabId` owned by the outsider. Every person's address is
 * confirmed and their password is `password`. `me` is the caller (null for anonymous);
 * `unique` is a fresh suffix for names and addresses that must not collide.
 */
export interface Fixture {
  actor: Actor;
  me: Person | null;
  labId: number;
  otherLabId: number;
  people: Record<Exclude<Actor, 'anonymous'>, Person>;
  unique: string;
}

export interface RequestSpec {
  /** Values for the [segments] of the path pattern, e.g. { labId: '3' }. */
  params?: Record<string, string>;
  query?: Record<string, string>;
  /** Sent as JSON. */
  body?: unknown;
  headers?: Record<string, string>;
}

export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RouteRow {
  method: Method;
  /** The route's folder under app/, as a pattern: '/api/labs/[labId]/members'. */
  path: string;
  /** Tells apart several rows for one route (different situations). */
  name?: string;
  /** Builds the request for one call (may insert rows it needs, e.g. a dataset in f.labId). */
  request?: (f: Fixture) => RequestSpec | Promise<RequestSpec>;
  /** Exactly the actors that must get a 2xx; everyone else must be refused. */
  allowed: readonly Actor[];
  /** Statuses a refused actor may get (default 401, 403, 404, 409). */
  refused?: readonly number[];
  /**
   * Non-GET rows are also sent once more, as the first allowed actor, with a foreign Origin
   * header, and must get 403 forbidden:origin. Set a reason string to skip that check.
   */
  csrfExempt?: string;
  /** Not called at all (e.g. Auth.js's own handler); the reason is required. */
  exempt?: string;
}

export interface ActionRow {
  /** 'app/labs/[labId]/memos/actions.ts#createMemo': file (from the project root) # export. */
  action: string;
  name?: string;
  /** Calls the action as the fixture's actor. */
  call?: (fn: (...args: never[]) => Promise<unknown>, f: Fixture) => Promise<unknown>;
  allowed: readonly Actor[];
  exempt?: string;
}

export type AuthzRow = RouteRow | ActionRow;

// ---- helpers for building requests ------------------------------------------------------

/** A one-time token (verification or reset) for a user, as if mailed. */
export async function tokenFor(userId: number, purpose: TokenPurpose): Promise<string> {
  const { token, hash } = newToken();
  await insertAuthToken({ userId, purpose, tokenHash: hash, expiresAt: new Date(Date.now() + 3_600_000) });
  return token;
}

/** A pending invitation into `labId` for `email`, issued by `invitedBy`; returns its id and link token. */
export async function invitationFor(labId: number, email: string, invitedBy: number, role: Role = 'reader'): Promise<{ id: number; token: string }> {
  const { token, hash } = newToken();
  const id = await insertInvitation({ labId, email, role, tokenHash: hash, invitedBy, expiresAt: new Date(Date.now() + 3_600_000) });
  return { id, token };
}

/** Raw SQL on the test database, for setting up a situation the API cannot reach directly. */
export async function sql(statement: string, values: unknown[] = []): Promise<void> {
  await getPool().query(statement, values);
}
