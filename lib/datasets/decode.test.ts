import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { decodeAll, Utf8Reader } from './decode';

function errorOf(f: () => unknown): AppError {
  try {
    f();
  } catch (e) {
    if (e instanceof AppError) return e;
    throw e;
  }
  throw new Error('expected an AppError');
}

const bytes = (...xs: number[]) => new Uint8Array(xs);
const utf8 = (s: string) => new TextEncoder().encode(s);

describe('UTF-8 check and decoding', () => {
  it('decodes UTF-8 text, dropping a byte-order mark', () => {
    expect(decodeAll(new Uint8Array([0xef, 0xbb, 0xbf, ...utf8('größe,µg/L\n1,2\n')]))).toBe('größe,µg/L\n1,2\n');
  });

  it('agrees with the WHATWG fatal UTF-8 decoder (Node TextDecoder) on random byte strings', () => {
    // Reference: the Encoding Standard's UTF-8 decoder with fatal: true, as built into Node.
    const rng = seedrandom('utf8-fuzz');
    const fatal = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
    let valid = 0;
    for (let t = 0; t < 4000; t++) {
      // Valid UTF-8 from random code points (1- to 4-byte forms), then, half the time, one
      // byte replaced by a byte near a multi-byte boundary, so both outcomes occur often.
      const points = Array.from({ length: 1 + Math.floor(rng() * 4) }, () => [0x41, 0xe9, 0x20ac, 0xd7ff, 0xe000, 0xfffd, 0x1f30a, 0x10ffff][Math.floor(rng() * 8)]);
      const b = new TextEncoder().encode(String.fromCodePoint(...points));
      const pool = [0x41, 0x7f, 0x80, 0x8f, 0x90, 0x9f, 0xa0, 0xbf, 0xc0, 0xc1, 0xc2, 0xdf, 0xe0, 0xed, 0xef, 0xf0, 0xf4, 0xf5, 0xff];
      if (rng() < 0.5) b[Math.floor(rng() * b.length)] = pool[Math.floor(rng() * pool.length)];
      const n = b.length;
      let expected = true;
      try {
        fatal.decode(b);
      } catch {
        expected = false;
      }
      let ours = true;
      try {
        const r = new Utf8Reader();
        // Feed it in two pieces to exercise sequences split across chunks.
        const cut = Math.floor(rng() * (n + 1));
        r.push(b.slice(0, cut));
        r.push(b.slice(cut));
        r.end();
      } catch (e) {
        if (!(e instanceof AppError)) throw e;
        // A NUL is valid UTF-8 but refused as binary; the pool has none.
        ours = false;
      }
      expect(ours, `bytes ${Array.from(b, (x) => x.toString(16)).join(' ')}`).toBe(expected);
      if (expected) valid++;
    }
    expect(valid).toBeGreaterThan(2000);
    expect(valid).toBeLessThan(3500);
  });

  it('names the line of a Latin-1 byte', () => {
    // "Müller" in Latin-1: ü is the single byte 0xFC, which is never valid UTF-8.
    const file = new Uint8Array([...utf8('name,value\nA,1\nM'), 0xfc, ...utf8('ller,2\n')]);
    const e = errorOf(() => decodeAll(file));
    expect(e.code).toBe('invalid:dataset');
    expect(e.path).toBe('line.3');
    expect(e.message).toMatch(/^Line 3 .*UTF-8/);
  });

  it('names the line even when the bad byte arrives in a later chunk', () => {
    const r = new Utf8Reader();
    r.push(utf8('a,b\n1,2\n'));
    r.push(utf8('3,4\n5,'));
    const e = errorOf(() => r.push(bytes(0xc3, 0x28)));
    expect(e.path).toBe('line.4');
  });

  it('refuses a file cut in the middle of a character', () => {
    const e = errorOf(() => decodeAll(new Uint8Array([...utf8('a\n'), 0xe2, 0x82])));
    expect(e.path).toBe('line.2');
  });

  it('refuses NUL bytes as binary, naming the line', () => {
    const e = errorOf(() => decodeAll(new Uint8Array([...utf8('a,b\n1,2\n'), 0, 1, 2])));
    expect(e.message).toMatch(/Line 3 contains a NUL byte/);
  });

  it('recognises common binary formats and UTF-16 by their first bytes', () => {
    expect(errorOf(() => decodeAll(bytes(0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0))).message).toMatch(/zip archive/);
    expect(errorOf(() => decodeAll(bytes(0x25, 0x50, 0x44, 0x46, 0x2d, 0x31))).message).toMatch(/PDF/);
    expect(errorOf(() => decodeAll(bytes(0xff, 0xfe, 0x61, 0x00))).message).toMatch(/UTF-16/);
    // "a,b\n" in UTF-16LE without a byte-order mark.
    expect(errorOf(() => decodeAll(bytes(0x61, 0, 0x2c, 0, 0x62, 0, 0x0a, 0, 0x31, 0, 0x2c, 0))).message).toMatch(/UTF-16/);
  });

  it('calls a zero-byte file empty', () => {
    expect(errorOf(() => decodeAll(new Uint8Array(0))).message).toBe('The file is empty.');
  });
});
