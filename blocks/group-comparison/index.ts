import { groupComparisonChart } from './chart';
import { defineBlockNode } from '../shared/node';
import { pickEngine } from '../shared/output';
import { INTERVAL_LABEL, newSeed } from '../shared/settings';
import { firstIssue, type BlockDefinition } from '../shared/types';
import type { GroupComparisonOutput } from './output';
import { groupComparisonAttrs, groupComparisonSettings, type GroupComparisonAttrs, type GroupComparisonSettings } from './schema';

const DEFAULTS: GroupComparisonAttrs = { dataset: null, value: '', group: '', levels: ['', ''], statistic: 'mean', B: 2000, seed: 'margin', level: 0.95, method: 'bca' };

export const groupComparison: BlockDefinition<GroupComparisonAttrs, GroupComparisonSettings, GroupComparisonOutput> = {
  type: 'group-comparison',
  label: 'Group comparison',
  summary: 'Two groups side by side, and their difference with its interval.',
  node: defineBlockNode('group-comparison', DEFAULTS),
  attrs: groupComparisonAttrs,
  newAttrs(ctx) {
    // Two groups need a text column to name them: prefer a dataset that has one.
    const ds = ctx.datasets.find((d) => d.columns.some((c) => c.type === 'text') && d.columns.some((c) => c.type === 'number')) ?? ctx.datasets[0];
    return {
      ...DEFAULTS,
      dataset: ds ? { datasetId: ds.id, versionId: null } : null,
      value: ds?.columns.find((c) => c.type === 'number')?.name ?? '',
      group: ds?.columns.find((c) => c.type === 'text')?.name ?? '',
      levels: [ds?.columns.find((c) => c.type === 'text')?.values?.[0] ?? '', ds?.columns.find((c) => c.type === 'text')?.values?.[1] ?? ''],
      seed: newSeed(),
    };
  },
  settings: groupComparisonSettings,
  runSettings(attrs) {
    if (!attrs.dataset) return { ok: false, reason: 'Choose a dataset.' };
    const r = groupComparisonSettings.safeParse(attrs);
    return r.success ? { ok: true, settings: r.data } : { ok: false, reason: firstIssue(r.error) };
  },
  outputs: (attrs) => [
    { key: 'difference', label: 'Difference (first − second)' },
    { key: 'difference-interval', label: `Difference, ${INTERVAL_LABEL[attrs.method]} interval` },
    { key: 'difference-se', label: 'Difference, standard error' },
    { key: 'first', label: `${attrs.levels[0] || 'First group'}: ${attrs.statistic}` },
    { key: 'second', label: `${attrs.levels[1] || 'Second group'}: ${attrs.statistic}` },
  ],
  pick(output, key) {
    if (key === 'difference') return pickEngine(output.difference, 'estimate');
    if (key === 'difference-se') return pickEngine(output.difference, 'se');
    if (key === 'difference-interval') {
      const method = Object.keys(output.difference.intervals)[0];
      return method ? pickEngine(output.difference, `interval:${method}`) : null;
    }
    if (key === 'first') return pickEngine(output.groups[0].response, 'estimate');
    if (key === 'second') return pickEngine(output.groups[1].response, 'estimate');
    return null;
  },
  chart: (output, attrs) => groupComparisonChart(output, { statistic: attrs.statistic, valueLabel: attrs.value }),
};
