import { defineBlockNode } from '../shared/node';
import type { BlockDefinition } from '../shared/types';
import { dataTableAttrs, type DataTableAttrs } from './schema';

export const dataTable: BlockDefinition<DataTableAttrs> = {
  type: 'data-table',
  label: 'Data table',
  summary: 'A dataset version as a table; small ones can be edited, making a new version.',
  node: defineBlockNode('data-table', { dataset: null }),
  attrs: dataTableAttrs,
  newAttrs: (ctx) => ({ dataset: ctx.datasets[0] ? { datasetId: ctx.datasets[0].id, versionId: null } : null }),
};
