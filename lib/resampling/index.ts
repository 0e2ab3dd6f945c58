/**
 * Margin's resampling engine: pure TypeScript, no Node or DOM APIs, deterministic for a
 * given seed. See PRODUCT.md ("The engine's request and response") for the contract.
 */
export { parseRequest } from './contract/parse';
export type { Advice, ConvergencePoint, EngineResponse, ExactResult, IntervalResult, JackknifeResult, TestResult, Warning } from './contract/response';
export { engineRequestSchema, INCLUDE_PARTS, INTERVAL_METHODS } from './contract/schema';
export type { EngineRequest, EngineRequestInput, IntervalMethod } from './contract/schema';
export { canonicalJson } from './data/canonical-json';
export { dataSha256 } from './data/data-hash';
export { finalize } from './engine/finalize';
export { LIMITS } from './engine/limits';
export { prepareProblem } from './engine/prepare';
export type { Problem } from './engine/problem';
export { drawAll, prepare, runRequest } from './engine/run-request';
export type { RunOptions } from './engine/run-request';
export { EngineError } from './errors';
export { CHUNK_SIZE, chunkCount, chunkRange } from './replicates/chunks';
export { resampleIndices } from './replicates/resample-indices';
export { runChunk } from './replicates/run-chunk';
export type { ChunkResult } from './replicates/run-chunk';
export { createRng, RNG_NAME } from './random/rng';
export type { Rng } from './random/rng';
export { PLANNED_SCHEMES, SCHEMES, schemeSchema } from './schemes/registry';
export type { SchemeSettings } from './schemes/registry';
export { STATISTICS, statisticSchema } from './statistics/registry';
export type { StatisticName, StatisticSettings } from './statistics/registry';
export { ENGINE_VERSION } from './version';
