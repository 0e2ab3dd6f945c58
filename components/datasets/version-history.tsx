import Link from 'next/link';
import { count, when } from './format';

export interface HistoryItem {
  version: number;
  sha256: string;
  rowCount: number;
  columnCount: number;
  createdAt: Date;
  createdByName: string | null;
  source: { kind: string; fileName?: string };
}

const HOW: Record<string, string> = { upload: 'uploaded', paste: 'pasted', edit: 'edited in a memo', seed: 'demo data' };

/** Every version, newest first; identical content (same SHA-256) as the version before is pointed out. */
export function VersionHistory({ labId, datasetId, versions, current }: { labId: number; datasetId: number; versions: HistoryItem[]; current: number }) {
  return (
    <section aria-labelledby="history-heading">
      <h2 id="history-heading" className="text-lg font-semibold">
        Versions
      </h2>
      <ol className="mt-3 space-y-2">
        {versions.map((v, k) => {
          const older = versions[k + 1];
          const same = older && older.sha256 === v.sha256;
          const isCurrent = v.version === current;
          return (
            <li key={v.version}>
              <Link
                href={`/labs/${labId}/datasets/${datasetId}?v=${v.version}`}
                aria-current={isCurrent ? 'page' : undefined}
                className={`block rounded-md border px-3 py-2 text-sm ${isCurrent ? 'border-river bg-river-wash/50' : 'border-paper-edge bg-white/60 hover:border-river-soft'}`}
              >
                <span className="flex items-baseline justify-between gap-2">
                  <span className="font-medium">Version {v.version}</span>
                  <span className="font-mono text-[11px] text-ink-faint" title={`SHA-256 ${v.sha256}`}>
                    {v.sha256.slice(0, 12)}
                  </span>
                </span>
                <span className="block text-xs text-ink-soft">
                  {count(v.rowCount)} rows × {v.columnCount} columns · {HOW[v.source.kind] ?? v.source.kind}
                  {v.source.fileName ? ` (${v.source.fileName})` : ''}
                </span>
                <span className="block text-xs text-ink-faint">
                  {when(v.createdAt)}
                  {v.createdByName ? ` · ${v.createdByName}` : ''}
                </span>
                {same && <span className="mt-1 block text-xs text-amber">Same data as version {older.version}</span>}
              </Link>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
