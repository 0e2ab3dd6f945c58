import 'server-only';

/**
 * Datasets: CSV uploads and pastes read into typed columns, stored as numbered, immutable,
 * content-hashed versions. Server-only; the browser preview imports `options`, `sniff` and
 * `values` directly.
 *
 * None of these functions authorizes: callers check `authorize(userId, labId, 'dataset:read'
 * | 'dataset:write')` first (for a version id, read its `labId` with `versionInfo`).
 *
 * For the memo and its blocks:
 *  - `loadDatasetVersion(versionId)` → `{ id, datasetId, labId, version, sha256, name,
 *    rowCount, columns: [{ name, type: 'number' | 'text' | 'date', missing, summary }],
 *    data: { [column]: (number | string | null)[] } }` — the whole version; numbers for number
 *    columns, ISO 8601 strings for dates, null for missing. Throws not_found:dataset.
 *  - `versionInfo(versionId)` → the same without `data`, or null (cheap: no cells).
 *  - `latestVersion(datasetId)` → the newest version's info, or null.
 *  - `listDatasets(labId)` → `[{ id, name, updatedAt, latest: { id, version, sha256,
 *    rowCount, columns, createdAt } }]`, by name.
 *  - `createVersionFromRows(datasetId, columns, rows, userId)` → `{ datasetId, versionId,
 *    version, sha256, rowCount, columns }`: saves an edited table (column names, rows of
 *    number | string | null) as the next version, read with the same type rules as an upload.
 *
 * For the dataset routes: `importCsv` (a streamed upload → new dataset or new version),
 * `readRows` (a page of rows), `datasetWithVersions`, `versionOfDataset`.
 *
 * A version's `sha256` is the SHA-256 of the table's canonical form (see `hash.ts`), so it
 * identifies the data itself, whatever file format it arrived in.
 */
export { createVersionFromRows, tableFromRows } from './from-rows';
export { importCsv, type ImportProgress, type ImportResult } from './ingest';
export { datasetWithVersions, latestVersion, listDatasets, loadDatasetVersion, readRows, versionInfo, versionOfDataset, type Cell, type DatasetListItem, type LoadedVersion, type VersionInfo } from './load';
export { storeTable, type StoredVersion } from './store';
export { parseCsv, parseCsvText, type ParsedTable } from './parse';
export type { ReadOptions } from './options';
