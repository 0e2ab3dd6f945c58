import { estimateSettings, type EstimateSettings } from '../estimate/schema';
import { linkedEstimateSettings } from '../shared/linked';
import { histogramChart } from './chart';
import { defineBlockNode } from '../shared/node';
import { pickEngine, type EngineOutput } from '../shared/output';
import type { BlockDefinition } from '../shared/types';
import { histogramAttrs, type HistogramAttrs } from './schema';

const DEFAULTS: HistogramAttrs = { source: null, bins: 40, normalCurve: true, qqPlot: false, method: null };

export const resampleHistogram: BlockDefinition<HistogramAttrs, EstimateSettings, EngineOutput> = {
  type: 'resample-histogram',
  label: 'Resample histogram',
  summary: "An Estimate's bootstrap replicates, with θ̂ and its interval marked.",
  node: defineBlockNode('resample-histogram', DEFAULTS),
  attrs: histogramAttrs,
  newAttrs: (ctx) => ({ ...DEFAULTS, source: ctx.estimates.at(-1)?.blockId ?? null }),
  settings: estimateSettings,
  runSettings: (attrs, find) => linkedEstimateSettings(attrs.source, find),
  outputs: () => [
    { key: 'estimate', label: 'Estimate θ̂' },
    { key: 'se', label: 'Standard error' },
  ],
  pick: (output, key) => pickEngine(output.response, key),
  chart: (output, attrs) => histogramChart(output.response, attrs),
};
