import { z } from 'zod';

/** Live value: one output (`output`, e.g. "estimate", "interval:bca") of a block (`block`). */
export const liveValueAttrs = z.object({
  block: z.string().min(1).max(64).nullable(),
  output: z.string().min(1).max(64),
});
export type LiveValueAttrs = z.infer<typeof liveValueAttrs>;
