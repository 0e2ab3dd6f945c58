import 'server-only';
import { findDatasetById } from '@/db/queries/datasets';
import { AppError } from '@/lib/errors';
import { ColumnBuilder, type ParsedColumn } from './column-builder';
import { MAX_COLUMN_NAME, MAX_COLUMNS, MAX_EDIT_ROWS } from './limits';
import { storeTable, type StoredVersion } from './store';

export type EditedCell = number | string | null | undefined;

function rowError(row: number, message: string) {
  return new AppError('invalid:dataset', message, `rows.${row}`);
}

/**
 * Reads an edited table (column names + rows of cells) with the same rules as an upload:
 * each cell is taken as the text a user would have typed (numbers as their shortest
 * spelling, null or "" as missing) and each column's type is decided afresh, so an edited
 * table hashes exactly as the same table uploaded as CSV would.
 */
export function tableFromRows(columns: (string | { name: string })[], rows: EditedCell[][]): { columns: ParsedColumn[]; rowCount: number } {
  const names = columns.map((c) => (typeof c === 'string' ? c : c.name).trim());
  if (names.length === 0) throw new AppError('invalid:dataset', 'The table has no columns.', 'columns');
  if (names.length > MAX_COLUMNS) throw new AppError('invalid:dataset', `A dataset may have at most ${MAX_COLUMNS} columns.`, 'columns');
  const seen = new Set<string>();
  names.forEach((n, j) => {
    if (!n) throw new AppError('invalid:dataset', `Column ${j + 1} has no name.`, `columns.${j}`);
    if (n.length > MAX_COLUMN_NAME) throw new AppError('invalid:dataset', `The name of column ${j + 1} is longer than ${MAX_COLUMN_NAME} characters.`, `columns.${j}`);
    if (seen.has(n)) throw new AppError('invalid:dataset', `Two columns are named "${n}"; column names must be different.`, `columns.${j}`);
    seen.add(n);
  });
  if (rows.length === 0) throw new AppError('invalid:dataset', 'The table has no rows.', 'rows');
  if (rows.length > MAX_EDIT_ROWS) throw new AppError('too_large:dataset', `An edited table may have at most ${MAX_EDIT_ROWS.toLocaleString('en')} rows; upload larger tables as a file.`, 'rows');
  const builders = names.map((n) => new ColumnBuilder(n, '.'));
  rows.forEach((row, i) => {
    if (!Array.isArray(row) || row.length !== names.length) throw rowError(i, `Row ${i + 1} has ${Array.isArray(row) ? row.length : 0} values, but the table has ${names.length} columns.`);
    row.forEach((cell, j) => {
      let text: string;
      if (cell === null || cell === undefined) text = '';
      else if (typeof cell === 'number') {
        if (!Number.isFinite(cell)) throw rowError(i, `Row ${i + 1}, column "${names[j]}" is not a finite number.`);
        text = String(cell);
      } else if (typeof cell === 'string') text = cell;
      else throw rowError(i, `Row ${i + 1}, column "${names[j]}" must be a number, text or empty.`);
      builders[j].push(text, i + 1);
    });
  });
  const parsed = builders.map((b) => b.finish());
  if (!parsed.some((c) => c.type === 'number')) throw new AppError('invalid:dataset', 'No column holds only numbers; a dataset needs at least one numeric column.', 'columns');
  return { columns: parsed, rowCount: rows.length };
}

/**
 * Saves an edited table as the next version of a dataset (never overwriting the one it came
 * from), in one transaction. Used by the Data table block. The caller has authorized
 * `dataset:write` on the dataset's lab.
 */
export async function createVersionFromRows(datasetId: number, columns: (string | { name: string })[], rows: EditedCell[][], userId: number): Promise<StoredVersion> {
  if (!(await findDatasetById(datasetId))) throw new AppError('not_found:dataset', 'No such dataset.');
  const table = tableFromRows(columns, rows);
  return storeTable({ datasetId }, table, { kind: 'edit' }, userId);
}
