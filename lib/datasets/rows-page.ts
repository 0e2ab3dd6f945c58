import 'server-only';
import { readRows, versionOfDataset } from './load';

/** A page of a version's rows; versions never change, so a page may be cached by the browser. */
export async function versionRowsPage(labId: number, datasetId: number, version: number, offset: number, limit: number) {
  const v = await versionOfDataset(labId, datasetId, version);
  const rows = await readRows(v, offset, limit);
  return { version: v.version, sha256: v.sha256, rowCount: v.rowCount, offset, columns: v.columns.map((c) => c.name), rows };
}
