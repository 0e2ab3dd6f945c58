import 'server-only';
import type { LoadedVersion } from '@/blocks/shared/columns';
import type { DatasetRef } from '@/blocks/shared/settings';
import { latestVersion, loadDatasetVersion, versionInfo } from '@/lib/datasets';
import { AppError } from '@/lib/errors';

/**
 * The dataset version a block's settings name, checked to belong to the lab: settings come
 * from a shared document and may name any id, so a version of another lab is "not found".
 */
export interface VersionMeta {
  versionId: number;
  datasetId: number;
  labId: number;
  version: number;
  sha256: string;
  name: string;
}

export async function resolveVersion(labId: number, ref: DatasetRef): Promise<VersionMeta> {
  const info = ref.versionId === null ? await latestVersion(ref.datasetId) : await versionInfo(ref.versionId);
  const meta = info ? { versionId: info.id, datasetId: info.datasetId, labId: info.labId, version: info.version, sha256: info.sha256, name: info.name } : null;
  if (!meta || meta.labId !== labId || meta.datasetId !== ref.datasetId) {
    throw new AppError('not_found:dataset', ref.versionId === null ? 'That dataset is not in this lab, or has no version yet.' : 'That dataset version is not in this lab.', 'dataset');
  }
  return meta;
}

// Versions never change after they are written, so loaded data can be kept: a few recent
// versions (bounded by cell count) spare the database when several blocks read one table.
const MAX_CELLS = 12_000_000;
const holder = globalThis as unknown as { __marginVersionCache?: Map<number, LoadedVersion> };
const cache = (holder.__marginVersionCache ??= new Map());

function cells(v: LoadedVersion) {
  return v.rowCount * v.columns.length;
}

export async function loadVersion(versionId: number): Promise<LoadedVersion> {
  const hit = cache.get(versionId);
  if (hit) {
    cache.delete(versionId);
    cache.set(versionId, hit);
    return hit;
  }
  const v = (await loadDatasetVersion(versionId)) as LoadedVersion;
  cache.set(versionId, v);
  let total = 0;
  for (const x of cache.values()) total += cells(x);
  for (const [id, x] of cache) {
    if (total <= MAX_CELLS || id === versionId) break;
    cache.delete(id);
    total -= cells(x);
  }
  return v;
}
