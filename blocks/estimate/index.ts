import { estimateChart } from './chart';
import { defineBlockNode } from '../shared/node';
import { engineOutputs, pickEngine, type EngineOutput } from '../shared/output';
import { newSeed } from '../shared/settings';
import { firstIssue, type BlockDefinition } from '../shared/types';
import { estimateAttrs, estimateSettings, type EstimateAttrs, type EstimateSettings } from './schema';

export function newEstimateAttrs(ctx: { datasets: { id: number; columns: { name: string; type: string }[] }[] }): EstimateAttrs {
  const ds = ctx.datasets[0];
  const numeric = ds?.columns.find((c) => c.type === 'number')?.name ?? '';
  return {
    dataset: ds ? { datasetId: ds.id, versionId: null } : null,
    filter: null,
    statistic: { name: 'median', column: numeric },
    scheme: { name: 'ordinary' },
    B: 2000,
    seed: newSeed(),
    level: 0.95,
    methods: ['percentile', 'bca'],
  };
}

export const ESTIMATE_DEFAULTS: EstimateAttrs = {
  dataset: null,
  filter: null,
  statistic: { name: 'median', column: '' },
  scheme: { name: 'ordinary' },
  B: 2000,
  seed: 'margin',
  level: 0.95,
  methods: ['percentile', 'bca'],
};

/** Turns Estimate attributes into run settings, or says what is missing. */
export function estimateRunSettings(attrs: EstimateAttrs) {
  if (!attrs.dataset) return { ok: false as const, reason: 'Choose a dataset.' };
  const r = estimateSettings.safeParse(attrs);
  return r.success ? { ok: true as const, settings: r.data } : { ok: false as const, reason: firstIssue(r.error) };
}

export const estimate: BlockDefinition<EstimateAttrs, EstimateSettings, EngineOutput> = {
  type: 'estimate',
  label: 'Estimate',
  summary: 'A statistic with its bootstrap standard error, bias and confidence intervals.',
  node: defineBlockNode('estimate', ESTIMATE_DEFAULTS),
  attrs: estimateAttrs,
  newAttrs: newEstimateAttrs,
  settings: estimateSettings,
  runSettings: (attrs) => estimateRunSettings(attrs),
  outputs: (attrs) => engineOutputs(attrs.methods),
  pick: (output, key) => pickEngine(output.response, key),
  chart: (output) => estimateChart(output.response),
};
