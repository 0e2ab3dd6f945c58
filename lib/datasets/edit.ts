import 'server-only';
import { findDataset } from '@/db/queries/datasets';
import { AppError } from '@/lib/errors';
import { createVersionFromRows, type EditedCell } from './from-rows';

/** Saves an edited table as the next version of a dataset of the lab; the caller has authorized `dataset:write`. */
export async function saveEditedTable(labId: number, datasetId: number, columns: string[], rows: EditedCell[][], userId: number) {
  if (!(await findDataset(labId, datasetId))) throw new AppError('not_found:dataset', 'No such dataset in this lab.');
  const v = await createVersionFromRows(datasetId, columns, rows, userId);
  return { version: { id: v.versionId, version: v.version, sha256: v.sha256, rowCount: v.rowCount, columns: v.columns }, url: `/labs/${labId}/datasets/${datasetId}?v=${v.version}` };
}
