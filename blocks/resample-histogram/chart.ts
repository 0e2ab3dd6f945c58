import type { TopLevelSpec } from 'vega-lite';
import type { EngineResponse } from '@/lib/resampling';
import { normalQuantile } from '@/lib/resampling/math/normal-quantile';
import { CHART_CONFIG, COLORS, finite } from '../shared/chart-theme';
import { INTERVAL_LABEL, type IntervalMethod } from '../shared/settings';

export interface HistogramOptions {
  bins: number;
  normalCurve: boolean;
  qqPlot: boolean;
  method: IntervalMethod | null;
}

/** Equal-width bins over [min, max] of the finite replicates. */
export function binReplicates(xs: number[], bins: number) {
  const lo = Math.min(...xs);
  const hi = Math.max(...xs);
  const width = hi > lo ? (hi - lo) / bins : 1;
  const counts = new Array(hi > lo ? bins : 1).fill(0);
  for (const x of xs) counts[Math.min(counts.length - 1, Math.floor((x - lo) / width))]++;
  return { width, bars: counts.map((count, i) => ({ x0: lo + i * width, x1: lo + (i + 1) * width, count })) };
}

/**
 * Histogram of the replicates θ*₁ … θ*_B with θ̂ (oxide) and the chosen interval's end
 * points (dashed) marked. The normal curve is N(mean θ*, sd θ*) scaled to counts
 * (B · bin width · density): where the histogram departs from it, normal-theory
 * intervals are suspect (Efron & Tibshirani 1993, §13). The normal quantile plot puts the
 * sorted replicates against Φ⁻¹((i − 0.5)/B); a straight line means near-normal.
 */
export function histogramChart(r: EngineResponse, opts: HistogramOptions): TopLevelSpec {
  const xs = finite(r.replicates);
  if (xs.length === 0) return { $schema: 'https://vega.github.io/schema/vega-lite/v6.json', config: CHART_CONFIG, data: { values: [] }, mark: 'point' };
  const { width, bars } = binReplicates(xs, opts.bins);
  const m = xs.reduce((a, b) => a + b, 0) / xs.length;
  const s = Math.sqrt(xs.reduce((a, b) => a + (b - m) * (b - m), 0) / Math.max(1, xs.length - 1));
  const methods = Object.keys(r.intervals) as IntervalMethod[];
  const method = opts.method && r.intervals[opts.method] ? opts.method : methods[0];
  const iv = method ? r.intervals[method] : undefined;
  const marks = [{ x: r.estimate, what: 'θ̂' }, ...(iv && iv.lower !== null && iv.upper !== null ? [{ x: iv.lower, what: `${INTERVAL_LABEL[method!]} lower` }, { x: iv.upper, what: `${INTERVAL_LABEL[method!]} upper` }] : [])];

  const layers: NonNullable<Extract<TopLevelSpec, { layer: unknown }>['layer']> = [
    {
      data: { values: bars },
      mark: { type: 'rect', color: COLORS.riverSoft, stroke: '#ffffff', strokeWidth: 0.5 },
      encoding: {
        x: { field: 'x0', type: 'quantitative', title: 'Replicate θ*', scale: { zero: false } },
        x2: { field: 'x1' },
        y: { field: 'count', type: 'quantitative', title: 'Replicates' },
        tooltip: [{ field: 'x0', format: '.4~g', title: 'from' }, { field: 'x1', format: '.4~g', title: 'to' }, { field: 'count' }],
      },
    },
  ];
  if (opts.normalCurve && s > 0) {
    const curve = Array.from({ length: 121 }, (_, i) => {
      const x = bars[0].x0 + ((bars.at(-1)!.x1 - bars[0].x0) * i) / 120;
      const z = (x - m) / s;
      return { x, y: (xs.length * width * Math.exp(-0.5 * z * z)) / (s * Math.sqrt(2 * Math.PI)) };
    });
    layers.push({ data: { values: curve }, mark: { type: 'line', color: COLORS.ink, strokeWidth: 1.5 }, encoding: { x: { field: 'x', type: 'quantitative' }, y: { field: 'y', type: 'quantitative' } } });
  }
  layers.push({
    data: { values: marks },
    mark: { type: 'rule', strokeWidth: 2 },
    encoding: {
      x: { field: 'x', type: 'quantitative' },
      color: { field: 'what', type: 'nominal', title: null, scale: { range: [COLORS.oxide, COLORS.amber, COLORS.amber] }, legend: { orient: 'top' } },
      strokeDash: { condition: { test: "datum.what === 'θ̂'", value: [1, 0] }, value: [5, 3] },
      tooltip: [{ field: 'what' }, { field: 'x', format: '.4~g' }],
    },
  });
  const histogram = { width: opts.qqPlot ? 340 : 520, height: 220, layer: layers };
  if (!opts.qqPlot) return { $schema: 'https://vega.github.io/schema/vega-lite/v6.json', config: CHART_CONFIG, ...histogram } as TopLevelSpec;

  const sorted = xs.slice().sort((a, b) => a - b);
  const step = Math.max(1, Math.floor(sorted.length / 300));
  const qq: { z: number; x: number }[] = [];
  for (let i = 0; i < sorted.length; i += step) qq.push({ z: normalQuantile((i + 0.5) / sorted.length), x: sorted[i] });
  const zs = [qq[0].z, qq.at(-1)!.z];
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: CHART_CONFIG,
    hconcat: [
      histogram,
      {
        width: 200,
        height: 220,
        layer: [
          { data: { values: qq }, mark: { type: 'point', size: 10, color: COLORS.river, filled: true }, encoding: { x: { field: 'z', type: 'quantitative', title: 'Normal quantile' }, y: { field: 'x', type: 'quantitative', title: 'Replicate θ*', scale: { zero: false } } } },
          { data: { values: zs.map((z) => ({ z, x: m + s * z })) }, mark: { type: 'line', color: COLORS.oxide }, encoding: { x: { field: 'z', type: 'quantitative' }, y: { field: 'x', type: 'quantitative' } } },
        ],
      },
    ],
  } as TopLevelSpec;
}
