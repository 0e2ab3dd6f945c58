// The datasets worker gives exactly what reading in-process gives — same columns, hash and
// stored bytes — passes the parser's errors on with their line, takes input in many small
// chunks, and stops when aborted. The in-process reference is parse.ts + prepare.ts, whose
// own tests check them against R, simple-statistics and @noble/hashes.
import { describe, expect, it } from 'vitest';
import { parseCsv } from './parse';
import { prepareTable } from './prepare';
import { readCsvInWorker } from './read-in-worker';

const enc = new TextEncoder();

async function* pieces(text: string, size: number) {
  const bytes = enc.encode(text);
  for (let i = 0; i < bytes.length; i += size) yield bytes.subarray(i, i + size);
}

function table(rows: number): string {
  let s = 'date;site;nitrate_mg_l;flow_m3_s\n';
  for (let i = 0; i < rows; i++) s += `2026-03-${String((i % 28) + 1).padStart(2, '0')};${i % 3 ? 'upstream' : 'downstream – below the weir'};${(2 + ((i * 37) % 100) / 40).toFixed(3).replace('.', ',')};${i % 11 ? (i / 7).toFixed(2).replace('.', ',') : 'NA'}\n`;
  return s;
}

describe('readCsvInWorker', () => {
  it('matches the in-process reading byte for byte', async () => {
    const text = table(70_000);
    const parsed = await parseCsv(pieces(text, 65_536));
    const inline = await prepareTable(parsed);
    const progress: string[] = [];
    const w = await readCsvInWorker(pieces(text, 65_536), {}, { onProgress: (p) => progress.push(p.phase) });
    expect(w.options).toEqual(parsed.options);
    expect(w.options).toMatchObject({ delimiter: ';', decimal: ',' });
    expect(w.rowCount).toBe(70_000);
    expect(w.bytes).toBe(enc.encode(text).length);
    expect(w.sha256).toBe(inline.sha256);
    expect(w.columns).toEqual(inline.columns);
    expect(w.chunks.length).toBe(inline.chunks.length);
    for (const [k, c] of w.chunks.entries()) {
      expect([c.columnIndex, c.chunkIndex, c.encoding]).toEqual([inline.chunks[k].columnIndex, inline.chunks[k].chunkIndex, inline.chunks[k].encoding]);
      expect(Buffer.compare(c.payload, inline.chunks[k].payload)).toBe(0);
    }
    expect(progress).toContain('hashing');
  });

  it('reads a file sent 7 bytes at a time (records and characters split across chunks) as sent whole', async () => {
    const text = table(300);
    const whole = await prepareTable(await parseCsv(pieces(text, 1 << 20)));
    const w = await readCsvInWorker(pieces(text, 7));
    expect(w.rowCount).toBe(300);
    expect(w.sha256).toBe(whole.sha256);
  });

  it('passes on a bad line as the parser names it', async () => {
    const bad = 'site,nitrate_mg_l\nup,2.1\ndown,3.4\nup,2.2,extra\n';
    await expect(readCsvInWorker(pieces(bad, 5))).rejects.toMatchObject({ name: 'AppError', code: 'invalid:dataset', path: 'line.4', message: expect.stringMatching(/^Line 4 has 3 fields, but line 1 has 2/) });
  });

  it('stops when aborted while waiting for more of the file', async () => {
    const abort = new AbortController();
    async function* stalls() {
      yield enc.encode('site,nitrate_mg_l\nup,2.1\n');
      setTimeout(() => abort.abort(), 20);
      await new Promise(() => {});
    }
    await expect(readCsvInWorker(stalls(), {}, { signal: abort.signal })).rejects.toMatchObject({ code: 'bad_request:dataset', message: expect.stringMatching(/cancelled/) });
  });
});
