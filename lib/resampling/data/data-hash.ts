import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex, utf8ToBytes } from '@noble/hashes/utils.js';
import { canonicalJson } from './canonical-json';

/**
 * SHA-256 (FIPS 180-4) of the canonical JSON of the request's data, as lowercase hex.
 * Uses @noble/hashes (a pure-JavaScript, synchronous implementation), so the engine stays
 * free of Node APIs. Cost O(size of the data).
 */
export function dataSha256(data: unknown): string {
  return bytesToHex(sha256(utf8ToBytes(canonicalJson(data))));
}
