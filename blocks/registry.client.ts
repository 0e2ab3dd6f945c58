'use client';

import type { AnyExtension } from '@tiptap/core';
import { ReactNodeViewRenderer, type NodeViewProps } from '@tiptap/react';
import type { ComponentType } from 'react';
import { convergencePlot } from './convergence-plot';
import { ConvergencePlotView } from './convergence-plot/view';
import { dataTable } from './data-table';
import { DataTableView } from './data-table/view';
import { estimate } from './estimate';
import { EstimateView } from './estimate/view';
import { groupComparison } from './group-comparison';
import { GroupComparisonView } from './group-comparison/view';
import { liveValueNode } from './live-value/node';
import { LiveValueView } from './live-value/view';
import { resampleHistogram } from './resample-histogram';
import { ResampleHistogramView } from './resample-histogram/view';
import type { BlockDefinition } from './shared/types';

export interface ClientBlock {
  definition: BlockDefinition<any, any, any>;
  View: ComponentType<NodeViewProps>;
}

/** Every block type's client half, in insert-menu order. Adding a block type: its folder and one line here (and in registry.server.ts). */
export const CLIENT_BLOCKS: readonly ClientBlock[] = [
  { definition: dataTable, View: DataTableView },
  { definition: estimate, View: EstimateView },
  { definition: resampleHistogram, View: ResampleHistogramView },
  { definition: convergencePlot, View: ConvergencePlotView },
  { definition: groupComparison, View: GroupComparisonView },
];

/** The block and Live value nodes with their React node views, for the editor. */
export function clientNodes(): AnyExtension[] {
  return [
    ...CLIENT_BLOCKS.map(({ definition, View }) => definition.node.extend({ addNodeView: () => ReactNodeViewRenderer(View as never) })),
    liveValueNode.extend({ addNodeView: () => ReactNodeViewRenderer(LiveValueView) }),
  ];
}
