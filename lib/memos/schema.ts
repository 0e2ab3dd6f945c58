import { z } from 'zod';

/** Request bodies of the memo routes (one schema per action). */
export const createMemoSchema = z.object({ title: z.string().trim().min(1, 'give the memo a title').max(200, 'titles are at most 200 characters').optional() });
export const patchMemoSchema = z
  .object({
    title: z.string().trim().min(1, 'give the memo a title').max(200, 'titles are at most 200 characters').optional(),
    archived: z.boolean().optional(),
  })
  .refine((b) => b.title !== undefined || b.archived !== undefined, { message: 'nothing to change: send a title or archived' });
export const saveMemoSchema = z.object({
  revision: z.number().int().positive(),
  doc: z.looseObject({ type: z.literal('doc'), content: z.array(z.unknown()).optional() }),
});
export const listMemosSchema = z.object({
  q: z.string().trim().max(200, 'searches are at most 200 characters').optional(),
  archived: z.enum(['0', '1']).optional(),
});
export const runRequestSchema = z.object({
  blockId: z.string().min(1).max(64),
  type: z.string().min(1).max(40),
  settings: z.unknown(),
});
