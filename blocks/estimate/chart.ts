import type { TopLevelSpec } from 'vega-lite';
import type { EngineResponse } from '@/lib/resampling';
import { CHART_CONFIG, COLORS } from '../shared/chart-theme';
import { INTERVAL_LABEL, type IntervalMethod } from '../shared/settings';

/** Each interval method's interval as a horizontal bar, with θ̂ as a vertical rule. */
export function estimateChart(r: EngineResponse, opts: { title?: string } = {}): TopLevelSpec {
  const rows = (Object.entries(r.intervals) as [IntervalMethod, { lower: number | null; upper: number | null }][])
    .filter(([, iv]) => iv.lower !== null && iv.upper !== null)
    .map(([m, iv]) => ({ method: INTERVAL_LABEL[m], lower: iv.lower, upper: iv.upper }));
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: CHART_CONFIG,
    title: opts.title,
    width: 420,
    height: Math.max(40, rows.length * 26),
    layer: [
      {
        data: { values: rows },
        mark: { type: 'rule', strokeWidth: 3, color: COLORS.river },
        encoding: {
          y: { field: 'method', type: 'nominal', title: null, sort: null },
          x: { field: 'lower', type: 'quantitative', title: 'Interval', scale: { zero: false } },
          x2: { field: 'upper' },
          tooltip: [{ field: 'method' }, { field: 'lower', format: '.4~g' }, { field: 'upper', format: '.4~g' }],
        },
      },
      {
        data: { values: [{ estimate: r.estimate }] },
        mark: { type: 'rule', color: COLORS.oxide, strokeWidth: 2, strokeDash: [4, 3] },
        encoding: { x: { field: 'estimate', type: 'quantitative' } },
      },
    ],
  };
}
