import 'server-only';
import type { z } from 'zod';
import type { EngineRequestInput, EngineResponse } from '@/lib/resampling';
import type { LoadedVersion } from './columns';
import type { DatasetRef } from './settings';
import type { DatasetInfo } from './output';

/**
 * The server half of a computing block type: which dataset its settings read, and the
 * engine requests that answer it. `plan` is pure (data in, requests out) so it is tested
 * without workers; lib/runs runs the requests on worker threads and calls `finish`.
 */
export interface ComputeDefinition<S = unknown, O = unknown> {
  kind: string;
  settings: z.ZodType<S>;
  dataset(settings: S): DatasetRef;
  plan(settings: S, version: LoadedVersion): Plan<O>;
}

export interface Plan<O> {
  requests: EngineRequestInput[];
  finish(responses: EngineResponse[]): O;
}

export function datasetInfo(v: LoadedVersion): DatasetInfo {
  return { datasetId: v.datasetId, versionId: v.id, version: v.version, name: v.name, sha256: v.sha256 };
}
