import type { TopLevelSpec } from 'vega-lite';
import type { EngineResponse } from '@/lib/resampling';
import { CHART_CONFIG, COLORS } from '../shared/chart-theme';
import { INTERVAL_LABEL, type IntervalMethod } from '../shared/settings';

/**
 * The SE and interval end points as computed from the first B replicates, for growing B,
 * on a log axis. The band is SE ± 2 × its Monte Carlo error at that B, using the
 * large-B approximation MCerr(ŝe_B) ≈ ŝe_B · √((κ − 1) / (4B)) with κ = 3 (normal
 * replicates; Efron & Tibshirani 1993, §6.4, eq. 6.9 with kurtosis 0): a trace that
 * leaves the band late suggests B is too small.
 */
export function convergenceChart(r: EngineResponse, opts: { show: 'se' | 'intervals' | 'both' }): TopLevelSpec {
  const pts = r.convergence ?? [];
  const se = pts.filter((p) => p.se !== null).map((p) => ({ B: p.B, se: p.se!, lo: p.se! * (1 - 2 * Math.sqrt(2 / (4 * p.B))), hi: p.se! * (1 + 2 * Math.sqrt(2 / (4 * p.B))) }));
  const ends = pts.flatMap((p) =>
    (Object.entries(p.intervals) as [IntervalMethod, { lower: number | null; upper: number | null }][]).flatMap(([m, iv]) => [
      ...(iv.lower !== null ? [{ B: p.B, value: iv.lower, series: `${INTERVAL_LABEL[m]} lower` }] : []),
      ...(iv.upper !== null ? [{ B: p.B, value: iv.upper, series: `${INTERVAL_LABEL[m]} upper` }] : []),
    ]),
  );
  const x = { field: 'B', type: 'quantitative' as const, scale: { type: 'log' as const }, title: 'Replicates B (log scale)' };
  const sePanel = {
    width: opts.show === 'both' ? 260 : 520,
    height: 200,
    title: 'Standard error',
    layer: [
      { data: { values: se }, mark: { type: 'area' as const, color: COLORS.riverWash, opacity: 0.9 }, encoding: { x, y: { field: 'lo', type: 'quantitative' as const, title: 'SE', scale: { zero: false } }, y2: { field: 'hi' } } },
      { data: { values: se }, mark: { type: 'line' as const, color: COLORS.river, point: { size: 16 } }, encoding: { x, y: { field: 'se', type: 'quantitative' as const }, tooltip: [{ field: 'B' }, { field: 'se', format: '.4~g' }] } },
    ],
  };
  const ivPanel = {
    width: opts.show === 'both' ? 260 : 520,
    height: 200,
    title: 'Interval end points',
    data: { values: ends },
    mark: { type: 'line' as const, point: { size: 12 } },
    encoding: {
      x,
      y: { field: 'value', type: 'quantitative' as const, title: 'End point', scale: { zero: false } },
      color: { field: 'series', type: 'nominal' as const, title: null, legend: { orient: 'bottom' as const, columns: 2 } },
      tooltip: [{ field: 'series' }, { field: 'B' }, { field: 'value', format: '.4~g' }],
    },
  };
  const base = { $schema: 'https://vega.github.io/schema/vega-lite/v6.json', config: { ...CHART_CONFIG, range: { category: [COLORS.river, COLORS.riverSoft, COLORS.oxide, '#c9765b', COLORS.amber, '#c9a45a', '#4f6b3a', '#7f9a68', COLORS.ink, COLORS.faint] } } };
  if (opts.show === 'se') return { ...base, ...sePanel } as TopLevelSpec;
  if (opts.show === 'intervals') return { ...base, ...ivPanel } as TopLevelSpec;
  return { ...base, hconcat: [sePanel, ivPanel] } as TopLevelSpec;
}
