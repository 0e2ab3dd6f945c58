import { describe, expect, it } from 'vitest';
import { canonicalJson } from '@/lib/resampling/data/canonical-json';
import { dataSha256 } from '@/lib/resampling/data/data-hash';
import { dataDigest } from './data-digest';

// Invented demo data: nitrate readings (mg/L) upstream and downstream of a treatment works.
const readings = Array.from({ length: 5000 }, (_, i) => Math.round((2 + Math.cos(i / 7) + ((i * 131) % 97) / 40) * 1000) / 1000);
const cases: [string, unknown][] = [
  ['a numeric column', { nitrate: readings }],
  ['missing and non-finite cells, awkward numbers', { nitrate: [1, null, Number.NaN, Number.POSITIVE_INFINITY, -0, 1e21, 5e-324, 0.1 + 0.2, -1.5e-7, undefined] }],
  ['labels with quotes, escapes and non-ASCII text', { site: ['up "weir"', 'down\\stream', 'Müllheim', 'a\nb', '\u2028', '\ud800', 'x'], flag: [true, false, null] }],
  ['columns in another order, nested values', { z: [{ b: 1, a: [2, 'x'] }], a: [[1, 2], [3]] }],
];

describe('dataDigest (node:crypto) against the engine’s pure-JS dataSha256', () => {
  for (const [name, data] of cases) {
    it(`gives the same digest: ${name}`, () => {
      expect(dataDigest(data)).toBe(dataSha256(data));
      expect(dataDigest(data)).toMatch(/^[0-9a-f]{64}$/);
    });
  }

  it('matches SHA-256 digests computed outside the project', () => {
    // Digests of these exact strings from GNU coreutils `printf '%s' STRING | sha256sum`.
    expect(canonicalJson({ b: [1], a: [2.5, null] })).toBe('{"a":[2.5,null],"b":[1]}');
    expect(dataDigest({ b: [1], a: [2.5, null] })).toBe('a2b5a02c5191008734c9a9cc07f61e1b2bc06110bab6170e8a4520314af58883');
    const data = { site: ['up', 'down', 'up'], nitrate: [1.25, Number.NaN, 3] };
    expect(dataDigest(data)).toBe('56906fad2047154f8137fc8aa00f7fc88056943f82e65589bceea8985cc4ade1');
    expect(dataSha256(data)).toBe('56906fad2047154f8137fc8aa00f7fc88056943f82e65589bceea8985cc4ade1');
  });

  it('canonicalJson writes a column of plain values exactly as element by element', () => {
    // The element-by-element form is the RFC 8785 rule canonical-json.ts states: each number
    // in shortest round-trip form (JSON.stringify of the number), non-finite and missing as null.
    const byElement = (xs: unknown[]) => `[${xs.map((v) => (typeof v === 'number' ? (Number.isFinite(v) ? JSON.stringify(v) : 'null') : v === null || v === undefined ? 'null' : JSON.stringify(v))).join(',')}]`;
    const holes: unknown[] = [1];
    holes[3] = 2;
    for (const xs of [readings, cases[1][1] as { nitrate: unknown[] }, cases[2][1] as { site: unknown[] }].map((c) => (Array.isArray(c) ? c : Object.values(c as object)[0]))) {
      expect(canonicalJson(xs)).toBe(byElement(xs as unknown[]));
    }
    expect(canonicalJson(holes)).toBe('[1,null,null,2]');
  });
});
