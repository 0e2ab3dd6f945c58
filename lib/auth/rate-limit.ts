import 'server-only';
import { clearHits, hitsSince, insertHits, pruneHits } from '@/db/queries/rate-limits';
import { AppError } from '../errors';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

interface Window {
  max: number;
  windowMs: number;
}

/**
 * Limits per kind of attempt, per account (the e-mail address typed, whether or not an
 * account exists, so the limit itself reveals nothing) and per client address. The numbers
 * are common practice for interactive sign-in (a handful of failures per quarter hour),
 * not taken from a standard.
 */
export const LIMITS = {
  'sign-in': { what: 'failed sign-in attempts', account: { max: 8, windowMs: 15 * MINUTE }, address: { max: 40, windowMs: 15 * MINUTE } },
  'password-reset': { what: 'password reset requests', account: { max: 3, windowMs: HOUR }, address: { max: 10, windowMs: HOUR } },
  'reset-confirm': { what: 'attempts to use a reset link', address: { max: 20, windowMs: HOUR } },
  'verify-resend': { what: 'verification e-mails', account: { max: 3, windowMs: HOUR } },
  'sign-up': { what: 'new accounts', address: { max: 10, windowMs: HOUR } },
  'change-password': { what: 'wrong current passwords', account: { max: 8, windowMs: 15 * MINUTE } },
  invite: { what: 'invitations', account: { max: 30, windowMs: HOUR } },
} satisfies Record<string, { what: string; account?: Window; address?: Window }>;

export type LimitName = keyof typeof LIMITS;
export interface LimitKeys {
  account?: string;
  address?: string;
}

function buckets(name: LimitName, keys: LimitKeys): { bucket: string; window: Window; scope: 'account' | 'address' }[] {
  const rule = LIMITS[name] as { account?: Window; address?: Window };
  const out: { bucket: string; window: Window; scope: 'account' | 'address' }[] = [];
  if (rule.account && keys.account) out.push({ bucket: `${name}:account:${keys.account.toLowerCase()}`.slice(0, 300), window: rule.account, scope: 'account' });
  if (rule.address && keys.address) out.push({ bucket: `${name}:address:${keys.address}`.slice(0, 300), window: rule.address, scope: 'address' });
  return out;
}

function wait(ms: number): string {
  const minutes = Math.max(1, Math.ceil(ms / MINUTE));
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}

/** Throws rate_limited (429) with a message saying when to retry, if any bucket is full. */
export async function assertWithinLimit(name: LimitName, keys: LimitKeys, now = new Date()): Promise<void> {
  for (const b of buckets(name, keys)) {
    const { count, oldest } = await hitsSince(b.bucket, new Date(now.getTime() - b.window.windowMs));
    if (count >= b.window.max) {
      const retryMs = (oldest ? oldest.getTime() + b.window.windowMs : now.getTime() + b.window.windowMs) - now.getTime();
      const who = b.scope === 'account' ? 'for this account' : 'from your network address';
      throw new AppError(`rate_limited:${name}`, `Too many ${LIMITS[name].what} ${who}. Try again in ${wait(retryMs)}.`);
    }
  }
}

/** Counts one attempt in every bucket that applies, and drops rows older than a day (no window is longer). */
export async function recordAttempt(name: LimitName, keys: LimitKeys, now = new Date()): Promise<void> {
  await insertHits(
    buckets(name, keys).map((b) => b.bucket),
    now,
  );
  await pruneHits(new Date(now.getTime() - 24 * HOUR));
}

/** assertWithinLimit, then recordAttempt: for attempts that count whether or not they succeed. */
export async function consumeLimit(name: LimitName, keys: LimitKeys, now = new Date()): Promise<void> {
  await assertWithinLimit(name, keys, now);
  await recordAttempt(name, keys, now);
}

/** Forgets an account's failures (after a successful sign-in). The per-address count stays. */
export async function clearAccountLimit(name: LimitName, account: string): Promise<void> {
  await clearHits(`${name}:account:${account.toLowerCase()}`.slice(0, 300));
}
