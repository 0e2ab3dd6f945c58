import 'server-only';
import { convergencePlot } from './convergence-plot';
import { convergenceCompute } from './convergence-plot/compute';
import { dataTable } from './data-table';
import { estimate } from './estimate';
import { estimateCompute } from './estimate/compute';
import { groupComparison } from './group-comparison';
import { groupComparisonCompute } from './group-comparison/compute';
import { resampleHistogram } from './resample-histogram';
import { histogramCompute } from './resample-histogram/compute';
import type { ComputeDefinition } from './shared/compute';
import type { BlockDefinition } from './shared/types';

export interface ServerBlock {
  definition: BlockDefinition<any, any, any>;
  /** How its run is computed; absent for blocks that only show data. */
  compute?: ComputeDefinition<any, any>;
}

/** Every block type's server half. Adding a block type: its folder and one line here (and in registry.client.ts). */
export const SERVER_BLOCKS: readonly ServerBlock[] = [
  { definition: dataTable },
  { definition: estimate, compute: estimateCompute },
  { definition: resampleHistogram, compute: histogramCompute },
  { definition: convergencePlot, compute: convergenceCompute },
  { definition: groupComparison, compute: groupComparisonCompute },
];

export function serverBlock(type: string): ServerBlock | undefined {
  return SERVER_BLOCKS.find((b) => b.definition.type === type);
}
