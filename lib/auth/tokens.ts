import 'server-only';
import { createHash, randomBytes } from 'node:crypto';

/**
 * One-time link tokens: 32 random bytes (256 bits) as base64url, so guessing is hopeless and
 * the token survives in a URL unescaped. Only the SHA-256 of a token is stored; a plain hash
 * (no salt, no slow KDF) is enough because the token itself is high-entropy random data.
 */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Tokens we issue are exactly 43 base64url characters; anything else is refused before a lookup. */
export const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
