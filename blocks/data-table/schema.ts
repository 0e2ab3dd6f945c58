import { z } from 'zod';
import { datasetRef } from '../shared/settings';

/**
 * Data table: one dataset version shown in a scrolling table. Small versions can be
 * edited cell by cell; each edit makes a new version (versions are never overwritten),
 * so blocks following the latest version recompute.
 */
export const dataTableAttrs = z.object({ dataset: datasetRef.nullable() });
export type DataTableAttrs = z.infer<typeof dataTableAttrs>;

// Editing sends the whole table back as a new version; above this many cells an edit would
// be slow to send and to store, so bigger tables are read-only here (edit by upload).
export const EDITABLE_CELLS = 200_000;

/** One cell edit: the row index in the base version, the column, and the new value. */
export const cellEdit = z.object({
  row: z.number().int().min(0),
  column: z.string().min(1).max(128),
  value: z.union([z.number().refine(Number.isFinite, 'a number must be finite'), z.string().max(10_000), z.null()]),
});
export const cellEditRequest = z.object({
  datasetId: z.number().int().positive(),
  baseVersionId: z.number().int().positive(),
  edits: z.array(cellEdit).min(1, 'no edits to save').max(1000, 'at most 1000 edits at once'),
});
export type CellEditRequest = z.infer<typeof cellEditRequest>;
