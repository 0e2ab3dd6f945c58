import { engineRequestSchema, type EngineRequestInput } from '@/lib/resampling';

/**
 * Body of POST /api/compute: exactly the engine's request (PRODUCT.md contract). The route
 * validates it with the engine's parseRequest, which applies this schema and names the
 * field at fault in the same form as the command line (`data.x[3]`, `statistic.column`).
 */
export const computeBodySchema = engineRequestSchema;
export type ComputeBody = EngineRequestInput;
