import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { nitrateSamples, toCsv } from '@/lib/demo/data';
import { parseCsv, parseCsvText } from './parse';

const utf8 = (s: string) => new TextEncoder().encode(s);

async function* pieces(text: string, size: number) {
  const b = utf8(text);
  for (let i = 0; i < b.length; i += size) yield b.slice(i, i + size);
}

async function failure(p: Promise<unknown>): Promise<AppError> {
  try {
    await p;
  } catch (e) {
    if (e instanceof AppError) return e;
    throw e;
  }
  throw new Error('expected the parse to fail');
}

const cells = (c: { values: ArrayLike<number | string | null> }) => Array.from(c.values as ArrayLike<number | string | null>, (v) => (typeof v === 'number' && Number.isNaN(v) ? null : v));

describe('reading a CSV file into typed columns', () => {
  it('detects number, text and date columns and counts missing values', async () => {
    const t = await parseCsvText('site,nitrate,date,note\nup,2.1,2026-03-01,ok\ndown,NA,2026-03-02,\nup,3,,"turbid, after rain"\n');
    expect(t.rowCount).toBe(3);
    expect(t.columns.map((c) => [c.name, c.type, c.missing])).toEqual([
      ['site', 'text', 0],
      ['nitrate', 'number', 1],
      ['date', 'date', 1],
      ['note', 'text', 1],
    ]);
    expect(cells(t.columns[1])).toEqual([2.1, null, 3]);
    expect(cells(t.columns[3])).toEqual(['ok', null, 'turbid, after rain']);
    expect(t.options).toEqual({ delimiter: ',', header: true, decimal: '.' });
  });

  it('reads the demo nitrate table as R would: 48 rows, site/sample_id text, the rest numbers', async () => {
    const rows = nitrateSamples();
    const t = await parseCsvText(toCsv(rows));
    expect(t.rowCount).toBe(rows.length);
    expect(t.columns.map((c) => c.type)).toEqual(['text', 'text', 'number', 'number', 'number']);
    expect(cells(t.columns[3])).toEqual(rows.map((r) => r.nitrate_mg_l));
  });

  it('gives the same table however the bytes are cut into chunks (records and characters split across chunks)', async () => {
    const text = 'name,value\n"Ö, ""quoted""\nline two",1.5\nplain,2\n"μ",3\n';
    const whole = await parseCsvText(text);
    for (const size of [1, 2, 3, 7, 64]) {
      const t = await parseCsv(pieces(text, size));
      expect(t.columns.map(cells)).toEqual(whole.columns.map(cells));
    }
    expect(cells(whole.columns[0])).toEqual(['Ö, "quoted"\nline two', 'plain', 'μ']);
  });

  it('names the line of a ragged row, counting lines inside quoted fields and blank lines', async () => {
    const e = await failure(parseCsvText('a,b\n"x\ny",1\n\nz,2\nw,3,4\n'));
    expect(e.code).toBe('invalid:dataset');
    expect(e.path).toBe('line.6');
    expect(e.message).toBe('Line 6 has 3 fields, but line 1 has 2. Check the delimiter (now comma) or put quotes around fields that contain it.');
  });

  it('names the line of a ragged row far into a large file', async () => {
    let text = 'x,y\n';
    for (let i = 0; i < 50_000; i++) text += `${i},${i * 2}\n`;
    text += '1\n';
    const e = await failure(parseCsv(pieces(text, 65536)));
    expect(e.path).toBe('line.50002');
  });

  it('refuses a quote that is never closed, naming its line', async () => {
    const e = await failure(parseCsvText('a,b\n1,2\n"open,3\n4,5\n'));
    expect(e.path).toBe('line.3');
    expect(e.message).toMatch(/never closed/);
  });

  it('refuses empty files, blank files and a header without rows', async () => {
    expect((await failure(parseCsvText(''))).message).toBe('The file is empty.');
    expect((await failure(parseCsvText('\n\n  \n'))).message).toMatch(/only blank lines/);
    expect((await failure(parseCsvText('a,b\n'))).message).toMatch(/header \(line 1\) but no data rows/);
  });

  it('refuses a table without a numeric column, pointing at the value that spoilt a mostly-numeric one', async () => {
    let text = 'site,nitrate\n';
    for (let i = 0; i < 20; i++) text += `s${i},${i === 7 ? '<0.5' : (1 + i / 10).toFixed(1)}\n`;
    const e = await failure(parseCsvText(text));
    expect(e.message).toMatch(/No column holds only numbers/);
    expect(e.message).toMatch(/Column "nitrate" is mostly numbers, but line 9 holds "<0.5"/);
  });

  it('keeps the exact text of numbers when a column turns out to be text', async () => {
    const t = await parseCsvText('id,v\n007,1\n2.50,2\nA12,3\n');
    expect(t.columns[0].type).toBe('text');
    expect(cells(t.columns[0])).toEqual(['007', '2.50', 'A12']);
  });

  it('refuses duplicate column names and names blank ones', async () => {
    expect((await failure(parseCsvText('a,b,a\n1,2,3\n'))).message).toBe('Line 1 names two columns "a" (columns 1 and 3); column names must be different.');
    const t = await parseCsvText(',value\nr1,1\n');
    expect(t.columns.map((c) => c.name)).toEqual(['column_1', 'value']);
  });

  it('drops the empty column a trailing delimiter makes', async () => {
    const t = await parseCsvText('a,b,\n1,2,\n3,4,\n');
    expect(t.columns.map((c) => c.name)).toEqual(['a', 'b']);
  });

  it('guesses semicolons with decimal commas, and lets the user override each guess', async () => {
    const t = await parseCsvText('site;nitrate\nup;2,85\ndown;3,10\n');
    expect(t.options).toEqual({ delimiter: ';', header: true, decimal: ',' });
    expect(cells(t.columns[1])).toEqual([2.85, 3.1]);
    const raw = await parseCsvText('1;2\n3;4\n', { header: false });
    expect(raw.columns.map((c) => c.name)).toEqual(['column_1', 'column_2']);
    expect(raw.rowCount).toBe(2);
    const tabs = await parseCsvText('a\tb\n1\t2\n');
    expect(tabs.options.delimiter).toBe('\t');
  });

  it('guesses "no header" when the first row holds numbers', async () => {
    const t = await parseCsvText('1.5,2\n3,4\n');
    expect(t.options.header).toBe(false);
    expect(t.rowCount).toBe(2);
  });

  it('reads CRLF line endings the same as LF', async () => {
    const a = await parseCsvText('a,b\r\n1,x\r\n2,y\r\n');
    const b = await parseCsvText('a,b\n1,x\n2,y\n');
    expect(a.columns.map(cells)).toEqual(b.columns.map(cells));
  });

  it('refuses a file over the byte limit', async () => {
    const e = await failure(parseCsv(pieces('a,b\n1,2\n3,4\n', 4), {}, { maxBytes: 8 }));
    expect(e.code).toBe('too_large:dataset');
  });
});

describe('quotes in the wrong place', () => {
  it('names the line of a field whose closing quote is followed by more text', async () => {
    const e = await failure(parseCsvText('a,b\nok,1\n"x"y,2\n3,4\n'));
    expect(e.path).toBe('line.3');
    expect(e.message).toMatch(/quote \(".*wrong place/);
  });
});
