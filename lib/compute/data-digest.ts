import 'server-only';
import { createHash } from 'node:crypto';
import { canonicalJson } from '@/lib/resampling/data/canonical-json';

/**
 * SHA-256 (FIPS 180-4) of the canonical JSON of a request's data, lowercase hex — the same
 * digest as the engine's pure-JS dataSha256 (lib/resampling/data/data-hash.ts), computed
 * with node:crypto (native code), which takes a few milliseconds less for large data on the
 * path of every response. compute.test.ts checks that the two agree.
 */
export function dataDigest(data: unknown): string {
  return createHash('sha256').update(canonicalJson(data), 'utf8').digest('hex');
}
