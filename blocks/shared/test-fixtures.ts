// Test helpers: a LoadedVersion built from the invented demo data (lib/demo/data.ts).
import { dailySeries, nitrateSamples } from '@/lib/demo/data';
import type { LoadedVersion } from './columns';

export function versionFromRows(rows: Record<string, number | string | null>[], opts: { id?: number; name?: string; types?: Record<string, string> } = {}): LoadedVersion {
  const names = Object.keys(rows[0]);
  const data: LoadedVersion['data'] = Object.fromEntries(names.map((n) => [n, rows.map((r) => r[n] ?? null)]));
  return {
    id: opts.id ?? 1,
    datasetId: 7,
    labId: 3,
    version: 1,
    sha256: 'f'.repeat(64),
    name: opts.name ?? 'Nitrate samples',
    rowCount: rows.length,
    columns: names.map((n) => ({ name: n, type: opts.types?.[n] ?? (rows.every((r) => r[n] === null || typeof r[n] === 'number') ? 'number' : 'text'), missing: rows.filter((r) => r[n] === null).length })),
    data,
  };
}

export const nitrateVersion = () => versionFromRows(nitrateSamples() as unknown as Record<string, number | string>[]);
export const dailyVersion = () => versionFromRows(dailySeries() as unknown as Record<string, number | string>[], { name: 'Daily downstream', types: { date: 'date' } });
