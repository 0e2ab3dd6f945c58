import type { ParsedColumn } from './column-builder';

/**
 * The stored form of a column, cut into chunks of `chunkRows` rows:
 *  - number columns: `f64`, the doubles as little-endian IEEE-754 bytes, NaN for missing
 *    (8 bytes a value; a 1,000,000-row column is 8 MB);
 *  - text and date columns: `json`, a UTF-8 JSON array of strings and nulls.
 */
export interface EncodedChunk {
  columnIndex: number;
  chunkIndex: number;
  encoding: 'f64' | 'json';
  payload: Buffer;
}

const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

export function* encodeChunks(columns: ParsedColumn[], rowCount: number, chunkRows: number): Generator<EncodedChunk> {
  for (let j = 0; j < columns.length; j++) {
    const col = columns[j];
    for (let k = 0, start = 0; start < rowCount || (k === 0 && rowCount === 0); k++, start += chunkRows) {
      const end = Math.min(rowCount, start + chunkRows);
      if (col.type === 'number') {
        const part = col.values.slice(start, end);
        if (!littleEndian) {
          const dv = new DataView(part.buffer);
          for (let i = 0; i < part.length; i++) dv.setFloat64(i * 8, part[i], true);
        }
        yield { columnIndex: j, chunkIndex: k, encoding: 'f64', payload: Buffer.from(part.buffer, part.byteOffset, part.byteLength) };
      } else {
        yield { columnIndex: j, chunkIndex: k, encoding: 'json', payload: Buffer.from(JSON.stringify(col.values.slice(start, end)), 'utf8') };
      }
      if (rowCount === 0) break;
    }
  }
}

/** Decodes one stored chunk back into cell values (null for missing). */
export function decodeChunk(encoding: 'f64' | 'json', payload: Buffer): (number | string | null)[] {
  if (encoding === 'f64') {
    const n = payload.byteLength / 8;
    const dv = new DataView(payload.buffer, payload.byteOffset, payload.byteLength);
    const out = new Array<number | null>(n);
    for (let i = 0; i < n; i++) {
      const x = dv.getFloat64(i * 8, true);
      out[i] = Number.isNaN(x) ? null : x;
    }
    return out;
  }
  return JSON.parse(payload.toString('utf8')) as (string | null)[];
}
