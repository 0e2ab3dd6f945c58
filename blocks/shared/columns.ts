import { AppError } from '@/lib/errors';
import type { RowFilter } from './settings';

/** A dataset version as lib/datasets loads it: columnar data plus its column types. */
export interface LoadedVersion {
  id: number;
  datasetId: number;
  labId: number;
  version: number;
  sha256: string;
  name: string;
  rowCount: number;
  columns: { name: string; type: string; missing: number }[];
  data: Record<string, (number | string | null)[]>;
}

export interface Extracted {
  data: Record<string, (number | string)[]>;
  /** Rows kept, and rows left out because one of the needed columns was empty. */
  n: number;
  dropped: number;
}

/**
 * Takes the columns a block needs out of a dataset version: keeps the rows matching the
 * filter, then leaves out rows where any needed column is empty (complete-case analysis,
 * reported to the reader as a count). Numeric columns must be of type number; the error
 * names the column and the settings field that chose it.
 */
export function extractColumns(
  version: LoadedVersion,
  need: { name: string; numeric: boolean; field: string }[],
  filter: RowFilter | null,
): Extracted {
  const types = new Map(version.columns.map((c) => [c.name, c.type]));
  for (const col of [...need, ...(filter ? [{ name: filter.column, numeric: false, field: 'filter.column' }] : [])]) {
    const t = types.get(col.name);
    if (!t) throw new AppError('invalid:block', `${version.name} v${version.version} has no column "${col.name}".`, col.field);
    if (col.numeric && t !== 'number') throw new AppError('invalid:block', `Column "${col.name}" holds ${t === 'text' ? 'text' : t + 's'}; this needs numbers.`, col.field);
  }
  const names = [...new Set(need.map((c) => c.name))];
  const out: Record<string, (number | string)[]> = Object.fromEntries(names.map((n) => [n, []]));
  const filterCol = filter ? version.data[filter.column] : null;
  let n = 0;
  let dropped = 0;
  for (let i = 0; i < version.rowCount; i++) {
    if (filterCol && String(filterCol[i] ?? '') !== filter!.value) continue;
    let complete = true;
    for (const name of names) {
      const v = version.data[name][i];
      if (v === null || v === undefined || v === '' || (typeof v === 'number' && !Number.isFinite(v))) {
        complete = false;
        break;
      }
    }
    if (!complete) {
      dropped++;
      continue;
    }
    for (const name of names) out[name].push(version.data[name][i] as number | string);
    n++;
  }
  if (n === 0) {
    const why = filter ? `no rows have ${filter.column} = "${filter.value}" with values in every needed column` : 'no row has values in every needed column';
    throw new AppError('invalid:block', `Nothing to compute: ${why}.`, filter ? 'filter.value' : need[0]?.field ?? '');
  }
  return { data: out, n, dropped };
}

/** The distinct values of a column, in first-seen order (for filter and group pickers). */
export function distinctValues(values: readonly (number | string | null)[], limit = 50): string[] {
  const seen = new Set<string>();
  for (const v of values) {
    if (v === null || v === '') continue;
    seen.add(String(v));
    if (seen.size >= limit) break;
  }
  return [...seen];
}
