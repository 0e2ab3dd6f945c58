import 'server-only';
import { importCsv, type ImportProgress } from './ingest';
import { delimiterName, type ReadOptions } from './options';

export interface UploadRequest {
  labId: number;
  userId: number;
  datasetId?: number;
  name?: string;
  options: Partial<ReadOptions>;
  source: { kind: 'upload' | 'paste'; fileName?: string };
  body: AsyncIterable<Uint8Array> | string;
  declaredBytes?: number;
  /** Aborted when the uploader cancels: nothing is stored. */
  signal?: AbortSignal;
}

/**
 * An upload or paste as the API answers it: the stored version, the options it was read
 * with (by name) and the page to see it on. The caller has authorized `dataset:write`.
 */
export async function uploadDataset(req: UploadRequest, onProgress?: (p: ImportProgress) => void) {
  const body =
    typeof req.body === 'string'
      ? (async function* (text: string) {
          yield new TextEncoder().encode(text);
        })(req.body)
      : req.body;
  const r = await importCsv({ ...req, body, onProgress });
  return {
    dataset: { id: r.datasetId, name: req.name ?? null },
    version: { id: r.versionId, version: r.version, sha256: r.sha256, rowCount: r.rowCount, columns: r.columns, bytes: r.bytes },
    options: { delimiter: delimiterName(r.options.delimiter), header: r.options.header, decimal: r.options.decimal === ',' ? 'comma' : 'point' },
    url: `/labs/${req.labId}/datasets/${r.datasetId}?v=${r.version}`,
  };
}
