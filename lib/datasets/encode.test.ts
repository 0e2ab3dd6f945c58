import { describe, expect, it } from 'vitest';
import { decodeChunk, encodeChunks } from './encode';
import { parseCsvText } from './parse';

describe('stored chunks', () => {
  it('round-trip every cell, with missing values as null, across chunk boundaries', async () => {
    let text = 'x,label,day\n';
    for (let i = 0; i < 25; i++) text += `${i % 7 === 0 ? 'NA' : i / 3},${i % 5 === 0 ? '' : `"l ${i}, ok"`},2026-03-${String(1 + (i % 28)).padStart(2, '0')}\n`;
    const t = await parseCsvText(text);
    const chunks = [...encodeChunks(t.columns, t.rowCount, 10)];
    expect(chunks.map((c) => `${c.columnIndex}.${c.chunkIndex}.${c.encoding}`)).toEqual(['0.0.f64', '0.1.f64', '0.2.f64', '1.0.json', '1.1.json', '1.2.json', '2.0.json', '2.1.json', '2.2.json']);
    // A number chunk is 8 bytes a value: IEEE-754 doubles.
    expect(chunks[0].payload.byteLength).toBe(80);
    expect(chunks[2].payload.byteLength).toBe(40);
    for (let j = 0; j < 3; j++) {
      const back = chunks.filter((c) => c.columnIndex === j).flatMap((c) => decodeChunk(c.encoding, c.payload));
      const original = Array.from(t.columns[j].values as ArrayLike<number | string | null>, (v) => (typeof v === 'number' && Number.isNaN(v) ? null : v));
      expect(back).toEqual(original);
    }
  });
});
