import { estimateSettings, type EstimateSettings } from '../estimate/schema';
import { linkedEstimateSettings } from '../shared/linked';
import { convergenceChart } from './chart';
import { defineBlockNode } from '../shared/node';
import { pickEngine, type EngineOutput } from '../shared/output';
import type { BlockDefinition } from '../shared/types';
import { convergenceAttrs, type ConvergenceAttrs } from './schema';

const DEFAULTS: ConvergenceAttrs = { source: null, show: 'both' };

export const convergencePlot: BlockDefinition<ConvergenceAttrs, EstimateSettings, EngineOutput> = {
  type: 'convergence-plot',
  label: 'Convergence plot',
  summary: 'SE and interval end points against B, with a Monte Carlo error band.',
  node: defineBlockNode('convergence-plot', DEFAULTS),
  attrs: convergenceAttrs,
  newAttrs: (ctx) => ({ ...DEFAULTS, source: ctx.estimates.at(-1)?.blockId ?? null }),
  settings: estimateSettings,
  runSettings: (attrs, find) => linkedEstimateSettings(attrs.source, find),
  outputs: () => [
    { key: 'mc-error', label: 'Monte Carlo error of the SE' },
    { key: 'se', label: 'Standard error' },
  ],
  pick: (output, key) => pickEngine(output.response, key),
  chart: (output, attrs) => convergenceChart(output.response, attrs),
};
