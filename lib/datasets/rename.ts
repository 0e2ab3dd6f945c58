import 'server-only';
import { findDataset, renameDataset } from '@/db/queries/datasets';
import { AppError } from '@/lib/errors';

/** Renames a dataset of the lab; the caller has authorized `dataset:write`. */
export async function renameLabDataset(labId: number, datasetId: number, name: string) {
  if (!(await findDataset(labId, datasetId))) throw new AppError('not_found:dataset', 'No such dataset in this lab.');
  await renameDataset(datasetId, name);
  return { id: datasetId, name };
}
