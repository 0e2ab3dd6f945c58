import { z } from 'zod';
import { DELIMITER_BY_NAME, DELIMITER_NAMES } from '@/lib/datasets/options';
import { MAX_DATASET_NAME, MAX_EDIT_ROWS, MAX_PAGE_ROWS } from '@/lib/datasets/limits';

const id = z.coerce.number().int().positive();

export const labParams = z.object({ labId: id });
export const datasetParams = labParams.extend({ datasetId: id });
export const versionParams = datasetParams.extend({ version: id });

export const datasetName = z.string().trim().min(1, 'Give the dataset a name.').max(MAX_DATASET_NAME, `A dataset name may have at most ${MAX_DATASET_NAME} characters.`);

/** How to read the file; each is guessed when left out. */
const readOptions = {
  delimiter: z.enum(DELIMITER_NAMES).optional(),
  header: z.union([z.boolean(), z.enum(['true', 'false']).transform((v) => v === 'true')]).optional(),
  decimal: z.enum(['point', 'comma']).optional(),
};

/** Query of a streamed upload (the body is the file itself). */
export const uploadQuery = z.object({
  ...readOptions,
  name: datasetName.optional(),
  fileName: z.string().max(255).optional(),
  source: z.enum(['upload', 'paste']).default('upload'),
});
export type UploadQuery = z.infer<typeof uploadQuery>;

/** A pasted table sent as JSON. */
export const pasteBody = z.object({
  ...readOptions,
  name: datasetName.optional(),
  csv: z.string().min(1, 'Paste a table first.').max(20 * 1024 * 1024, 'A pasted table may have at most 20 MB; upload larger ones as a file.'),
});

const cell = z.union([z.number(), z.string().max(10_000), z.null()]);
/** An edited table (Data table block): column names and rows of cells. */
export const editBody = z.object({
  columns: z.array(z.string().trim().min(1).max(100)).min(1).max(200),
  rows: z.array(z.array(cell)).min(1).max(MAX_EDIT_ROWS),
});

export const versionBody = z.union([pasteBody.omit({ name: true }), editBody]);

export const renameBody = z.object({ name: datasetName });

export const rowsQuery = z.object({
  offset: z.coerce.number().int().min(0).default(0),
  limit: z.coerce.number().int().min(1).max(MAX_PAGE_ROWS).default(200),
});

/** Options in the form lib/datasets takes them. */
export function readOptionsOf(q: { delimiter?: (typeof DELIMITER_NAMES)[number]; header?: boolean; decimal?: 'point' | 'comma' }) {
  return {
    ...(q.delimiter ? { delimiter: DELIMITER_BY_NAME[q.delimiter] } : {}),
    ...(q.header !== undefined ? { header: q.header } : {}),
    ...(q.decimal ? { decimal: q.decimal === 'comma' ? (',' as const) : ('.' as const) } : {}),
  };
}
