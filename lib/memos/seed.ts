import 'server-only';
import { ESTIMATE_DEFAULTS } from '@/blocks/estimate';
import type { DocJson } from '@/db/schema';
import { listDatasets } from '@/lib/datasets';
import type { SeedStep } from '@/lib/demo/seed';
import { SCHEMES } from '@/lib/resampling';
import { createMemo } from './service';

const t = (text: string): DocJson => ({ type: 'text', text });
const p = (...content: DocJson[]): DocJson => ({ type: 'paragraph', content });
const h = (text: string): DocJson => ({ type: 'heading', attrs: { level: 2 }, content: [t(text)] });
const live = (block: string, output: string): DocJson => ({ type: 'liveValue', attrs: { block, output } });

/**
 * The demo memo: the invented water-quality study of lib/demo/data.ts written up around live
 * blocks — the grab samples as a table, the downstream median with its histogram and
 * convergence, upstream against downstream, and the daily series. Added by the lab's
 * Author after the demo datasets exist (seedDatasets runs first).
 */
export const seedMemos: SeedStep = async ({ labId, userIds }) => {
  const author = userIds[1] ?? userIds[0];
  const datasets = await listDatasets(labId);
  const samples = datasets.find((d) => d.name === 'Nitrate grab samples');
  const daily = datasets.find((d) => d.name === 'Daily downstream series');
  if (!samples || !daily) return;
  const ref = (id: number) => ({ datasetId: id, versionId: null });
  // A serially correlated series needs a block scheme; until the engine runs one, the
  // ordinary bootstrap is used and the diagnostics' warning about dependence shows.
  const seriesScheme = SCHEMES.has('moving-block') ? { name: 'moving-block', blockLength: 'auto' } : { name: 'ordinary' };
  const doc: DocJson = {
    type: 'doc',
    content: [
      p(t('Grab samples were taken twice per visit, upstream and downstream of the treatment works, over twelve visits. Nitrate is in mg/L as N.')),
      { type: 'data-table', attrs: { blockId: 'demo-table', dataset: ref(samples.id) } },
      h('Downstream nitrate'),
      p(t('The downstream median is '), live('demo-median', 'estimate'), t(' mg/L (standard error '), live('demo-median', 'se'), t('), with a 95% BCa interval of '), live('demo-median', 'interval:bca'), t('.')),
      {
        type: 'estimate',
        attrs: { ...ESTIMATE_DEFAULTS, blockId: 'demo-median', dataset: ref(samples.id), filter: { column: 'site', value: 'downstream' }, statistic: { name: 'median', column: 'nitrate_mg_l' }, B: 2000, seed: 'riverside-median', methods: ['percentile', 'bca'] },
      },
      { type: 'resample-histogram', attrs: { blockId: 'demo-histogram', source: 'demo-median', bins: 30, normalCurve: true, qqPlot: true, method: 'bca' } },
      { type: 'convergence-plot', attrs: { blockId: 'demo-convergence', source: 'demo-median', show: 'both' } },
      h('Upstream against downstream'),
      p(t('On average downstream exceeds upstream by '), live('demo-sites', 'difference'), t(' mg/L (95% BCa interval '), live('demo-sites', 'difference-interval'), t('), resampling within each site.')),
      { type: 'group-comparison', attrs: { blockId: 'demo-sites', dataset: ref(samples.id), value: 'nitrate_mg_l', group: 'site', levels: ['downstream', 'upstream'], statistic: 'mean', B: 2000, seed: 'riverside-sites', level: 0.95, method: 'bca' } },
      h('The daily series'),
      p(t('Daily downstream readings average '), live('demo-daily', 'estimate'), t(' mg/L (95% percentile interval '), live('demo-daily', 'interval:percentile'), t('). Consecutive days are alike, so check the resampling scheme and the warnings under the block before quoting this interval.')),
      { type: 'estimate', attrs: { ...ESTIMATE_DEFAULTS, blockId: 'demo-daily', dataset: ref(daily.id), filter: null, statistic: { name: 'mean', column: 'nitrate_mg_l' }, scheme: seriesScheme, B: 2000, seed: 'riverside-daily', methods: ['percentile'] } },
    ],
  };
  await createMemo(labId, author, 'Nitrate below the treatment works', doc);
};
