import { AppError } from '@/lib/errors';
import type { LoadedVersion } from '../shared/columns';
import type { CellEditRequest } from './schema';

/**
 * Applies cell edits to a copy of a version's rows (the base is never changed). A value
 * for a number column must be a number (or empty); the error names the row and column.
 * Returns rows in the form lib/datasets' createVersionFromRows takes.
 */
export function applyCellEdits(base: LoadedVersion, edits: CellEditRequest['edits']): (number | string | null)[][] {
  const names = base.columns.map((c) => c.name);
  const cols = names.map((n) => base.data[n].slice());
  edits.forEach((e, k) => {
    const c = names.indexOf(e.column);
    if (c < 0) throw new AppError('invalid:cell', `There is no column "${e.column}".`, `edits.${k}.column`);
    if (e.row >= base.rowCount) throw new AppError('invalid:cell', `Row ${e.row + 1} is beyond the last row (${base.rowCount}).`, `edits.${k}.row`);
    let v = e.value;
    if (base.columns[c].type === 'number') {
      if (typeof v === 'string') {
        const t = v.trim();
        if (t === '') v = null;
        else if (Number.isFinite(Number(t))) v = Number(t);
        else throw new AppError('invalid:cell', `Row ${e.row + 1}, ${e.column}: "${v}" is not a number.`, `edits.${k}.value`);
      }
    } else if (typeof v === 'number') v = String(v);
    if (typeof v === 'string' && v.trim() === '') v = null;
    cols[c][e.row] = v;
  });
  const rows: (number | string | null)[][] = new Array(base.rowCount);
  for (let i = 0; i < base.rowCount; i++) rows[i] = cols.map((col) => col[i] ?? null);
  return rows;
}
