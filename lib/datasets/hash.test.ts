import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalText, hashTable } from './hash';
import { parseCsvText } from './parse';

describe('content hash', () => {
  it('uses SHA-256 as FIPS 180-4 defines it (the "abc" example of FIPS 180-2, appendix B.1)', () => {
    expect(createHash('sha256').update('abc').digest('hex')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('writes the canonical form described in hash.ts', async () => {
    const t = await parseCsvText('site,"nitrate mg/L",day\n"up, left",2.50,2026-03-01\ndown,NA,\n');
    expect(canonicalText(t.columns, t.rowCount)).toBe('margin-table/1\n"site"\t"nitrate mg/L"\t"day"\ntext\tnumber\tdate\n"up, left"\t2.5\t"2026-03-01"\n"down"\t\t\n');
  });

  it('equals an independent SHA-256 (@noble/hashes) of the canonical text', async () => {
    const t = await parseCsvText('a,b\n1,x\n2,"y\tz"\n-0.000001,\n');
    const expected = bytesToHex(sha256(new TextEncoder().encode(canonicalText(t.columns, t.rowCount))));
    expect(await hashTable(t.columns, t.rowCount)).toBe(expected);
  });

  it('is the same for the same table whatever the delimiter, quoting, line endings or number spelling', async () => {
    const a = await parseCsvText('site,v\nup,2.5\ndown,1e3\n');
    const b = await parseCsvText('"site";"v"\r\n"up";2,50\r\n"down";1000\r\n', { decimal: ',' });
    expect(await hashTable(b.columns, b.rowCount)).toBe(await hashTable(a.columns, a.rowCount));
  });

  it('changes when one value, a column name or the row order changes', async () => {
    const base = await parseCsvText('site,v\nup,2.5\ndown,3\n');
    const h = await hashTable(base.columns, base.rowCount);
    for (const other of ['site,v\nup,2.5\ndown,3.01\n', 'place,v\nup,2.5\ndown,3\n', 'site,v\ndown,3\nup,2.5\n', 'site,v\nup,2.5\ndown,\n']) {
      const t = await parseCsvText(other);
      expect(await hashTable(t.columns, t.rowCount)).not.toBe(h);
    }
  });
});
