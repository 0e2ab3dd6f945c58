import { lineError, tableError } from './errors';

/**
 * Turns the bytes of an upload into text, chunk by chunk, refusing what is not UTF-8 text:
 * binary files (NUL bytes, or the signature of a known binary format), UTF-16, and byte
 * sequences that are not well-formed UTF-8 — each with the line where it happens.
 *
 * Well-formedness follows the Unicode Standard, chapter 3, Table 3-7 ("Well-Formed UTF-8
 * Byte Sequences"): it rejects overlong forms, surrogates (ED A0..BF) and code points above
 * U+10FFFF, as the WHATWG Encoding standard's fatal UTF-8 decoder does. One pass over the
 * bytes does the check and counts newlines (0x0A) for the line numbers; cost O(bytes).
 */
export class Utf8Reader {
  private readonly decoder = new TextDecoder('utf-8');
  /** Continuation bytes still expected, and the allowed range of the next one. */
  private need = 0;
  private lo = 0x80;
  private hi = 0xbf;
  private seqLine = 1;
  private line = 1;
  private started = false;
  bytes = 0;

  /** Validates and decodes one chunk; throws an AppError naming the line on bad input. */
  push(chunk: Uint8Array): string {
    if (!this.started && chunk.length > 0) {
      this.started = true;
      checkSignature(chunk);
    }
    this.scan(chunk);
    this.bytes += chunk.length;
    return this.decoder.decode(chunk, { stream: true });
  }

  /** Ends the stream: a multi-byte sequence cut off at the end of the file is an error. */
  end(): string {
    if (this.need > 0) throw notUtf8(this.seqLine, 'ends in the middle of a multi-byte character');
    return this.decoder.decode();
  }

  private scan(b: Uint8Array) {
    let { need, lo, hi, line, seqLine } = this;
    for (let i = 0; i < b.length; i++) {
      const c = b[i];
      if (need > 0) {
        if (c < lo || c > hi) throw notUtf8(seqLine, `has a byte sequence that is not UTF-8 (byte 0x${hex(c)} where a continuation byte was expected)`);
        need--;
        lo = 0x80;
        hi = 0xbf;
        continue;
      }
      if (c < 0x80) {
        if (c === 0x0a) line++;
        else if (c === 0) throw lineError(line, `Line ${line} contains a NUL byte: this looks like a binary file, not CSV text.`);
        continue;
      }
      seqLine = line;
      if (c >= 0xc2 && c <= 0xdf) need = 1;
      else if (c === 0xe0) (need = 2), (lo = 0xa0);
      else if ((c >= 0xe1 && c <= 0xec) || c === 0xee || c === 0xef) need = 2;
      else if (c === 0xed) (need = 2), (hi = 0x9f);
      else if (c === 0xf0) (need = 3), (lo = 0x90);
      else if (c >= 0xf1 && c <= 0xf3) need = 3;
      else if (c === 0xf4) (need = 3), (hi = 0x8f);
      else throw notUtf8(line, `has a byte that never occurs in UTF-8 (0x${hex(c)})`);
    }
    Object.assign(this, { need, lo, hi, line, seqLine });
  }
}

function hex(c: number) {
  return c.toString(16).toUpperCase().padStart(2, '0');
}

function notUtf8(line: number, what: string) {
  return lineError(line, `Line ${line} ${what}. The file is probably in another encoding (such as Latin-1 or Windows-1252): save it as UTF-8 and upload it again.`);
}

// File signatures ("magic numbers") of binary formats people upload by mistake.
const SIGNATURES: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a zip archive (a spreadsheet workbook is one): export the sheet as CSV first' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an older office document: export the sheet as CSV first' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip-compressed file: decompress it first' },
];

function checkSignature(b: Uint8Array) {
  for (const s of SIGNATURES) {
    if (b.length >= s.bytes.length && s.bytes.every((x, i) => b[i] === x)) throw lineError(1, `This is not a CSV text file: it looks like ${s.what}.`);
  }
  if (b.length >= 2 && ((b[0] === 0xff && b[1] === 0xfe) || (b[0] === 0xfe && b[1] === 0xff))) {
    throw lineError(1, 'The file is in UTF-16, not UTF-8: save it as "CSV UTF-8" (or re-encode it as UTF-8) and upload it again.');
  }
  // UTF-16 without a byte-order mark: ASCII text with a NUL beside every character.
  if (b.length >= 8) {
    let zerosOdd = 0;
    let zerosEven = 0;
    const n = Math.min(b.length, 512);
    for (let i = 0; i < n; i++) if (b[i] === 0) i % 2 ? zerosOdd++ : zerosEven++;
    if (Math.max(zerosOdd, zerosEven) > n / 4) throw lineError(1, 'The file looks like UTF-16 text, not UTF-8: save it as UTF-8 and upload it again.');
  }
}

/** Decodes a whole byte array (a paste, a small file). */
export function decodeAll(bytes: Uint8Array): string {
  const r = new Utf8Reader();
  const text = r.push(bytes) + r.end();
  if (r.bytes === 0) throw tableError('The file is empty.');
  return text;
}
