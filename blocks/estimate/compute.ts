import 'server-only';
import type { EngineRequestInput } from '@/lib/resampling';
import { extractColumns, type LoadedVersion } from '../shared/columns';
import { datasetInfo, type ComputeDefinition } from '../shared/compute';
import type { EngineOutput } from '../shared/output';
import { statisticColumns } from '../shared/settings';
import { estimateSettings, type EstimateSettings } from './schema';

/** The columns an Estimate reads, with the settings field that chose each (for messages). */
export function neededColumns(s: EstimateSettings) {
  const fields: Record<string, string[]> = {
    correlation: ['statistic.x', 'statistic.y'],
    'regression-slope': ['statistic.x', 'statistic.y'],
    'regression-intercept': ['statistic.x', 'statistic.y'],
    'ratio-of-means': ['statistic.numerator', 'statistic.denominator'],
  };
  const cols = statisticColumns(s.statistic).map((name, i) => ({ name, numeric: true, field: (fields[s.statistic.name] ?? ['statistic.column'])[i] }));
  if (s.scheme.name === 'stratified' || s.scheme.name === 'cluster') cols.push({ name: s.scheme.by, numeric: false, field: 'scheme.by' });
  return cols;
}

/**
 * Settings + one dataset version → one engine request (PRODUCT.md contract). The data
 * sent holds only the columns needed, after the row filter and complete-case step, so the
 * engine's data hash in the provenance names exactly what was resampled. The convergence
 * trace is always asked for: the advice on B is read from it.
 */
export function estimateRequest(s: EstimateSettings, version: LoadedVersion) {
  const x = extractColumns(version, neededColumns(s), s.filter);
  const request: EngineRequestInput = {
    data: x.data,
    statistic: s.statistic,
    // Schemes the engine version does not run yet are refused by the engine with a clear message.
    scheme: s.scheme as EngineRequestInput['scheme'],
    B: s.B,
    seed: s.seed,
    intervals: { level: s.level, methods: s.methods },
    include: ['convergence'],
  };
  return { request, n: x.n, dropped: x.dropped };
}

export const estimateCompute: ComputeDefinition<EstimateSettings, EngineOutput> = {
  kind: 'estimate',
  settings: estimateSettings,
  dataset: (s) => s.dataset,
  plan(s, version) {
    const { request, n, dropped } = estimateRequest(s, version);
    return { requests: [request], finish: ([response]) => ({ response, n, dropped, dataset: datasetInfo(version) }) };
  },
};
