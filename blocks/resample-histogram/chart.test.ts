// Histogram and the other block figures: pure Vega-Lite specs, rendered to SVG on the server
// with vega's headless view (the same path as the export route).
import { describe, expect, it } from 'vitest';
import { runRequest } from '@/lib/resampling';
import { renderSvg } from '@/components/charts/svg.server';
import { convergenceChart } from '../convergence-plot/chart';
import { estimateChart } from '../estimate/chart';
import { estimateRequest } from '../estimate/compute';
import type { EstimateSettings } from '../estimate/schema';
import { nitrateVersion } from '../shared/test-fixtures';
import { binReplicates, histogramChart } from './chart';

const s: EstimateSettings = { dataset: { datasetId: 7, versionId: null }, filter: null, statistic: { name: 'median', column: 'nitrate_mg_l' }, scheme: { name: 'ordinary' }, B: 300, seed: 'chart', level: 0.95, methods: ['percentile', 'bca'] };

describe('block charts', () => {
  const req = estimateRequest(s, nitrateVersion()).request;
  req.include = ['replicates', 'convergence'];
  const r = runRequest(req);

  it('bins every finite replicate exactly once', () => {
    const xs = r.replicates!.filter((x): x is number => x !== null);
    const { bars, width } = binReplicates(xs, 25);
    expect(bars.reduce((a, b) => a + b.count, 0)).toBe(xs.length);
    expect(bars[0].x0).toBe(Math.min(...xs));
    expect(bars.at(-1)!.x1).toBeCloseTo(Math.max(...xs), 9);
    expect(width).toBeGreaterThan(0);
  });

  it('marks θ̂ and the chosen interval, and scales the normal curve to counts', () => {
    const spec = histogramChart(r, { bins: 20, normalCurve: true, qqPlot: false, method: 'bca' }) as { layer: { data: { values: { x: number; what?: string; y?: number }[] } }[] };
    const marks = spec.layer.at(-1)!.data.values;
    expect(marks.map((m) => m.what)).toEqual(['θ̂', 'BCa lower', 'BCa upper']);
    expect(marks[1].x).toBe(r.intervals.bca!.lower);
    // The curve's area (Σ y·Δx over a fine grid) ≈ B·binwidth·1 = total count × binwidth.
    const curve = spec.layer[1].data.values;
    const dx = curve[1].x - curve[0].x;
    const area = curve.reduce((a, p) => a + p.y! * dx, 0);
    const xs = r.replicates!.filter((x): x is number => x !== null);
    expect(area / (xs.length * binReplicates(xs, 20).width)).toBeGreaterThan(0.9);
  });

  it('renders histogram (with Q-Q plot), estimate and convergence figures to SVG', async () => {
    for (const spec of [histogramChart(r, { bins: 30, normalCurve: true, qqPlot: true, method: null }), estimateChart(r), convergenceChart(r, { show: 'both' })]) {
      const svg = await renderSvg(spec);
      expect(svg.startsWith('<svg')).toBe(true);
      expect(svg).toContain('</svg>');
      expect(svg.length).toBeGreaterThan(1000);
    }
  });
});
