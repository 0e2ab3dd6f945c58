'use client';

import { useQuery } from '@tanstack/react-query';
import type { DatasetRef } from '@/blocks/shared/settings';
import { api } from './api';
import { useMemoContext } from './memo-context';
import { useLatestVersion } from './results-store';

interface VersionRow {
  id: number;
  version: number;
  rowCount: number;
  createdAt: string;
}

/**
 * In a block's header: which version of its dataset the block reads — "Latest", which
 * follows new uploads and edits, or one numbered version, pinned, so the block's numbers stay
 * as they are whatever happens to the data later. The versions are fetched when needed and
 * again after an edit in this memo makes a new one.
 */
export function VersionPicker({ value, onChange, disabled }: { value: DatasetRef | null; onChange: (ref: DatasetRef) => void; disabled: boolean }) {
  const ctx = useMemoContext();
  const datasetId = value?.datasetId;
  const epoch = useLatestVersion(ctx.store, datasetId);
  const versions = useQuery({
    queryKey: ['dataset-versions', ctx.labId, datasetId, epoch],
    enabled: datasetId !== undefined,
    queryFn: ({ signal }) => api<{ versions: VersionRow[] }>(`/api/labs/${ctx.labId}/datasets/${datasetId}`, { signal }).then((r) => r.versions),
    staleTime: 30_000,
    placeholderData: (prev) => prev,
  });
  if (!value) return null;
  const list = versions.data ?? [];
  const latest = list[0] ?? null;
  const pinned = value.versionId !== null;
  const known = !pinned || list.some((v) => v.id === value.versionId);
  return (
    <label className="inline-flex items-center gap-1.5 text-xs text-ink-soft" data-version-pin={pinned ? 'pinned' : 'latest'}>
      <span>Data version</span>
      <select
        aria-label="Dataset version"
        className={`rounded border px-1.5 py-0.5 text-xs ${pinned ? 'border-river/60 bg-river-wash text-river' : 'border-paper-edge bg-white text-ink'} disabled:opacity-70`}
        value={value.versionId === null ? 'latest' : String(value.versionId)}
        disabled={disabled}
        onChange={(e) => onChange({ datasetId: value.datasetId, versionId: e.target.value === 'latest' ? null : Number(e.target.value) })}
      >
        <option value="latest">{latest ? `Latest (now v${latest.version})` : 'Latest'}</option>
        {!known && <option value={String(value.versionId)}>Pinned version</option>}
        {list.map((v) => (
          <option key={v.id} value={String(v.id)}>
            Pin v{v.version} · {v.rowCount.toLocaleString('en')} rows · {new Date(v.createdAt).toLocaleDateString('en-CA')}
          </option>
        ))}
      </select>
    </label>
  );
}
