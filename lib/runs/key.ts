import { createHash } from 'node:crypto';
import { canonicalJson } from './canonical-json';

export { canonicalJson };

export interface RunKeyInput {
  /** The computation's kind (two block types that compute the same thing share a kind). */
  kind: string;
  /** SHA-256 of the dataset version's content (not its id: equal data, equal key). */
  dataSha256: string;
  /** Settings after the block's zod schema parsed them (defaults filled, strings trimmed). */
  settings: unknown;
  engineVersion: string;
}

/**
 * A run's key: SHA-256 over (kind, data version hash, settings, engine version). A result
 * is reused exactly when all four match; a new engine version recomputes everything.
 */
export function runKey(input: RunKeyInput): string {
  const text = canonicalJson({ v: 1, kind: input.kind, data: input.dataSha256, settings: input.settings, engine: input.engineVersion });
  return createHash('sha256').update(text).digest('hex');
}
