import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalJson, runKey } from './key';

const input = { kind: 'estimate', dataSha256: 'a'.repeat(64), settings: { B: 2000, seed: 's', statistic: { name: 'median', column: 'x' } }, engineVersion: 'e/1' };

describe('run key', () => {
  it('writes object keys in sorted order at every level (RFC 8785 ordering)', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { f: 1, e: 'x' }], c: null } })).toBe('{"a":{"c":null,"d":[2,{"e":"x","f":1}]},"b":1}');
    expect(() => canonicalJson({ x: Number.NaN })).toThrow();
  });

  it('is the SHA-256 of the canonical JSON of kind, data hash, settings and engine version', () => {
    const expected = createHash('sha256').update(canonicalJson({ v: 1, kind: 'estimate', data: 'a'.repeat(64), settings: input.settings, engine: 'e/1' })).digest('hex');
    expect(runKey(input)).toBe(expected);
    expect(runKey(input)).toMatch(/^[0-9a-f]{64}$/);
  });

  it('does not depend on the order settings were written in', () => {
    expect(runKey({ ...input, settings: { statistic: { column: 'x', name: 'median' }, seed: 's', B: 2000 } })).toBe(runKey(input));
  });

  it('changes when any input changes', () => {
    const k = runKey(input);
    expect(runKey({ ...input, kind: 'estimate-replicates' })).not.toBe(k);
    expect(runKey({ ...input, dataSha256: 'b'.repeat(64) })).not.toBe(k);
    expect(runKey({ ...input, engineVersion: 'e/2' })).not.toBe(k);
    expect(runKey({ ...input, settings: { ...input.settings, B: 2001 } })).not.toBe(k);
  });
});
