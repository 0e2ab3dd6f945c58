import { z } from 'zod';

const id = (what: string) => z.coerce.number({ error: `${what} must be a number` }).int().positive(`${what} must be a positive whole number`);

export const labParams = z.object({ labId: id('labId') });
export const memoParams = labParams.extend({ memoId: id('memoId') });
export const blockParams = memoParams.extend({ blockId: z.string().min(1).max(64) });
export const tableQuery = z.object({ datasetId: id('datasetId'), versionId: id('versionId').optional() });
