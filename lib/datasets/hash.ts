import { createHash } from 'node:crypto';
import type { ColumnType } from '@/db/tables/datasets';
import { TimeSlicer } from './time-slicer';

export interface HashableColumn {
  name: string;
  type: ColumnType;
  values: Float64Array | ArrayLike<string | null>;
}

const BATCH_ROWS = 4096;

/**
 * The canonical form of a table, the text whose SHA-256 is a version's content hash. It
 * depends only on the parsed table — column names, types and values — not on the file's
 * delimiter, quoting, line endings or number spelling, so the same table uploaded as CSV
 * or as tab-separated text, or saved from a Data table block, gets the same hash:
 *
 *   line 1      margin-table/1
 *   line 2      the column names, each as a JSON string, separated by TAB
 *   line 3      the column types (number | text | date), separated by TAB
 *   then        one line per row, fields separated by TAB:
 *                 number  ECMAScript Number::toString (shortest text that reads back as the
 *                         same double: 2.5, 0.1, 1e-7; −0 writes as 0)
 *                 text, date  a JSON string ("a\tb" stays escaped, so TAB and newline are safe)
 *                 missing  nothing (an empty field)
 *   every line ends with LF (0x0A); the text is UTF-8.
 */
export function* canonicalPieces(columns: HashableColumn[], rowCount: number): Generator<string> {
  yield `margin-table/1\n${columns.map((c) => JSON.stringify(c.name)).join('\t')}\n${columns.map((c) => c.type).join('\t')}\n`;
  const cells = columns.map((c) => (c.type === 'number' ? (c.values as Float64Array) : (c.values as ArrayLike<string | null>)));
  const isNum = columns.map((c) => c.type === 'number');
  const m = columns.length;
  for (let start = 0; start < rowCount; start += BATCH_ROWS) {
    const end = Math.min(rowCount, start + BATCH_ROWS);
    let out = '';
    for (let i = start; i < end; i++) {
      for (let j = 0; j < m; j++) {
        if (j > 0) out += '\t';
        if (isNum[j]) {
          const x = (cells[j] as Float64Array)[i];
          if (!Number.isNaN(x)) out += String(x);
        } else {
          const s = (cells[j] as ArrayLike<string | null>)[i];
          if (s !== null) out += JSON.stringify(s);
        }
      }
      out += '\n';
    }
    yield out;
  }
}

/** The whole canonical text (for small tables and tests). */
export function canonicalText(columns: HashableColumn[], rowCount: number): string {
  return [...canonicalPieces(columns, rowCount)].join('');
}

/** SHA-256 (FIPS 180-4) of the canonical form, as 64 lower-case hex digits; yields to the event loop as it goes. */
export async function hashTable(columns: HashableColumn[], rowCount: number): Promise<string> {
  const h = createHash('sha256');
  const slicer = new TimeSlicer();
  for (const piece of canonicalPieces(columns, rowCount)) {
    h.update(piece, 'utf8');
    await slicer.maybeYield();
  }
  return h.digest('hex');
}
