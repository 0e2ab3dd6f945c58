/**
 * Limits on what a dataset upload may hold. They keep one upload from exhausting the
 * server: 1,000,000 rows × 5 columns (about 50 MB of CSV) is the size the product must
 * handle comfortably; the byte limit leaves room above it.
 */
export const MAX_UPLOAD_BYTES = 200 * 1024 * 1024;
export const MAX_ROWS = 5_000_000;
export const MAX_COLUMNS = 200;
export const MAX_COLUMN_NAME = 100;
export const MAX_DATASET_NAME = 120;
/** One record longer than this is almost surely an unclosed quote running on through the file. */
export const MAX_RECORD_CHARS = 1024 * 1024;
/** Rows per stored chunk of one column (a number chunk is 256 KiB of doubles). */
export const CHUNK_ROWS = 32_768;
/** Rows a page of the rows route may return at once. */
export const MAX_PAGE_ROWS = 1000;
/** Tables edited in a Data table block and saved with createVersionFromRows stay small. */
export const MAX_EDIT_ROWS = 100_000;
