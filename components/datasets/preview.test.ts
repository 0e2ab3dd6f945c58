import { describe, expect, it } from 'vitest';
import { previewOf } from './preview';

const utf8 = (s: string) => new TextEncoder().encode(s);

describe('upload preview', () => {
  it('shows the guessed options, column names and types of the first rows', () => {
    const p = previewOf({ text: 'site;nitrate;day\nup;2,1;2026-03-01\ndown;3,4;2026-03-02\n' }, {});
    expect(p.options).toEqual({ delimiter: ';', header: true, decimal: ',' });
    expect(p.names).toEqual(['site', 'nitrate', 'day']);
    expect(p.types).toEqual(['text', 'number', 'date']);
    expect(p.problem).toBeNull();
  });

  it('follows a correction: no header row makes the first line data', () => {
    const p = previewOf({ text: 'site,nitrate\nup,2.1\n' }, { header: false });
    expect(p.names).toEqual(['column_1', 'column_2']);
    expect(p.rows[0]).toEqual(['site', 'nitrate']);
  });

  it('names the line of a ragged row as the server would, counting blank lines', () => {
    const p = previewOf({ text: 'a,b\n1,2\n\n3,4,5\n' }, {});
    expect(p.problem).toBe('Line 4 has 3 fields, but line 1 has 2. Check the delimiter.');
  });

  it('reports a bad encoding from the sample bytes without reading the rest of the file', () => {
    const p = previewOf({ bytes: new Uint8Array([...utf8('a,b\nM'), 0xfc, ...utf8('ller,1\n')]), whole: false }, {});
    expect(p.problem).toMatch(/^Line 2 .*UTF-8/);
  });
});
