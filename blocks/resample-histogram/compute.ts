import 'server-only';
import { estimateRequest } from '../estimate/compute';
import { estimateSettings, type EstimateSettings } from '../estimate/schema';
import { datasetInfo, type ComputeDefinition } from '../shared/compute';
import type { EngineOutput } from '../shared/output';

/** The linked Estimate's request, also asking the engine for the replicates themselves. */
export const histogramCompute: ComputeDefinition<EstimateSettings, EngineOutput> = {
  kind: 'estimate-replicates',
  settings: estimateSettings,
  dataset: (s) => s.dataset,
  plan(s, version) {
    const { request, n, dropped } = estimateRequest(s, version);
    request.include = ['replicates', 'convergence'];
    return { requests: [request], finish: ([response]) => ({ response, n, dropped, dataset: datasetInfo(version) }) };
  },
};
