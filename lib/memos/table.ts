import 'server-only';
import { applyCellEdits } from '@/blocks/data-table/edit';
import { EDITABLE_CELLS, type CellEditRequest } from '@/blocks/data-table/schema';
import type { DatasetRef } from '@/blocks/shared/settings';
import { createVersionFromRows, latestVersion } from '@/lib/datasets';
import { AppError } from '@/lib/errors';
import { loadVersion, resolveVersion } from '@/lib/runs/datasets';

// A Data table block shows this many rows at most; the dataset page pages through the rest.
export const TABLE_ROWS = 5000;

/** The rows a Data table block shows: a version of a dataset of the lab (the latest unless pinned). */
export async function tablePage(labId: number, ref: DatasetRef) {
  const meta = await resolveVersion(labId, ref);
  const v = await loadVersion(meta.versionId);
  const latest = await latestVersion(meta.datasetId);
  const n = Math.min(v.rowCount, TABLE_ROWS);
  const cols = v.columns.map((c) => v.data[c.name]);
  const rows = Array.from({ length: n }, (_, i) => cols.map((col) => col[i] ?? null));
  return {
    datasetId: v.datasetId,
    versionId: v.id,
    version: v.version,
    latestVersion: latest?.version ?? v.version,
    name: v.name,
    rowCount: v.rowCount,
    columns: v.columns.map((c) => ({ name: c.name, type: c.type, missing: c.missing })),
    rows,
    editable: v.rowCount <= TABLE_ROWS && v.rowCount * v.columns.length <= EDITABLE_CELLS,
  };
}

/**
 * Saves cell edits as a new version of the dataset. The edits must be based on the latest
 * version: an edit of an older one would silently drop whatever changed in between, so it
 * is refused and the block reloads.
 */
export async function editCells(labId: number, req: CellEditRequest, userId: number) {
  const meta = await resolveVersion(labId, { datasetId: req.datasetId, versionId: req.baseVersionId });
  const latest = await latestVersion(meta.datasetId);
  if (latest && latest.id !== meta.versionId) throw new AppError('conflict:dataset', `This table has changed since you opened it (now v${latest.version}). Reload to edit the newest version.`, 'baseVersionId');
  const base = await loadVersion(meta.versionId);
  if (base.rowCount > TABLE_ROWS) throw new AppError('too_large:dataset', 'This dataset is too large to edit in a memo; upload a corrected file instead.');
  const rows = applyCellEdits(base, req.edits);
  const stored = await createVersionFromRows(base.datasetId, base.columns.map((c) => c.name), rows, userId);
  return { versionId: stored.versionId, version: stored.version, sha256: stored.sha256 };
}
