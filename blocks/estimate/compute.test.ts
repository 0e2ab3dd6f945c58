// Estimate block: settings → engine request → result, run through the real (synchronous)
// engine. Point estimates are checked against simple-statistics (an outside library).
import { median, mean, sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { nitrateSamples } from '@/lib/demo/data';
import { runRequest } from '@/lib/resampling';
import { nitrateVersion, versionFromRows } from '../shared/test-fixtures';
import { estimateCompute, estimateRequest } from './compute';
import { estimateRunSettings, newEstimateAttrs } from './index';
import { estimateSettings, type EstimateSettings } from './schema';

const base: EstimateSettings = {
  dataset: { datasetId: 7, versionId: null },
  filter: { column: 'site', value: 'downstream' },
  statistic: { name: 'median', column: 'nitrate_mg_l' },
  scheme: { name: 'ordinary' },
  B: 400,
  seed: 'unit',
  level: 0.95,
  methods: ['percentile', 'bca'],
};

describe('estimate settings', () => {
  it('accepts complete settings and names the field of bad ones', () => {
    expect(estimateSettings.safeParse(base).success).toBe(true);
    const low = estimateSettings.safeParse({ ...base, B: 50 });
    expect(low.success).toBe(false);
    expect(low.error!.issues[0].path).toEqual(['B']);
    expect(low.error!.issues[0].message).toMatch(/at least 100/);
    const noMethod = estimateSettings.safeParse({ ...base, methods: [] });
    expect(noMethod.error!.issues[0].path).toEqual(['methods']);
    const trim = estimateSettings.safeParse({ ...base, statistic: { name: 'trimmed-mean', column: 'x', trim: 0.6 } });
    expect(trim.error!.issues[0].path).toEqual(['statistic', 'trim']);
  });

  it('says what is missing before a dataset is chosen', () => {
    const attrs = newEstimateAttrs({ datasets: [] });
    const rs = estimateRunSettings(attrs);
    expect(rs).toEqual({ ok: false, reason: 'Choose a dataset.' });
    const withData = newEstimateAttrs({ datasets: [{ id: 7, columns: [{ name: 'site', type: 'text' }, { name: 'nitrate_mg_l', type: 'number' }] }] });
    expect(withData.statistic).toEqual({ name: 'median', column: 'nitrate_mg_l' });
    expect(estimateRunSettings(withData).ok).toBe(true);
  });
});

describe('estimate request', () => {
  it('sends only the needed column of the filtered rows', () => {
    const { request, n, dropped } = estimateRequest(base, nitrateVersion());
    const downstream = nitrateSamples().filter((r) => r.site === 'downstream').map((r) => r.nitrate_mg_l);
    expect(Object.keys(request.data)).toEqual(['nitrate_mg_l']);
    expect(request.data.nitrate_mg_l).toEqual(downstream);
    expect(n).toBe(24);
    expect(dropped).toBe(0);
    expect(request.intervals).toEqual({ level: 0.95, methods: ['percentile', 'bca'] });
  });

  it('leaves out rows with an empty needed value, and counts them', () => {
    const v = versionFromRows([
      { x: 1, y: 2 },
      { x: null, y: 3 },
      { x: 4, y: null },
      { x: 5, y: 6 },
    ]);
    const s = { ...base, filter: null, statistic: { name: 'correlation', x: 'x', y: 'y', method: 'pearson' } } as EstimateSettings;
    const { request, n, dropped } = estimateRequest(s, v);
    expect(request.data).toEqual({ x: [1, 5], y: [2, 6] });
    expect([n, dropped]).toEqual([2, 2]);
  });

  it('refuses a text column for a numeric statistic, naming the field', () => {
    const s = { ...base, statistic: { name: 'mean', column: 'site' } } as EstimateSettings;
    expect(() => estimateRequest(s, nitrateVersion())).toThrow(expect.objectContaining({ code: 'invalid:block', path: 'statistic.column', message: expect.stringMatching(/"site" holds text/) }));
    const missing = { ...base, statistic: { name: 'mean', column: 'nope' } } as EstimateSettings;
    expect(() => estimateRequest(missing, nitrateVersion())).toThrow(/has no column "nope"/);
    const empty = { ...base, filter: { column: 'site', value: 'estuary' } };
    expect(() => estimateRequest(empty, nitrateVersion())).toThrow(expect.objectContaining({ path: 'filter.value' }));
  });

  it('computes the median of the filtered rows, agreeing with simple-statistics, with a finite SE', () => {
    const plan = estimateCompute.plan(base, nitrateVersion());
    const out = plan.finish(plan.requests.map((r) => runRequest(r)));
    const downstream = nitrateSamples().filter((r) => r.site === 'downstream').map((r) => r.nitrate_mg_l);
    expect(out.response.estimate).toBeCloseTo(median(downstream), 12);
    expect(out.response.se).toBeGreaterThan(0);
    expect(out.response.intervals.bca!.lower!).toBeLessThan(out.response.estimate);
    expect(out.response.intervals.bca!.upper!).toBeGreaterThan(out.response.estimate);
    expect(out.response.convergence!.length).toBeGreaterThan(1);
    expect(out.dataset).toEqual({ datasetId: 7, versionId: 1, version: 1, name: 'Nitrate samples', sha256: 'f'.repeat(64) });
  });

  it('stratifies by site for the whole-table mean: estimate equals the plain mean (simple-statistics)', () => {
    const s = { ...base, filter: null, statistic: { name: 'mean', column: 'nitrate_mg_l' }, scheme: { name: 'stratified', by: 'site' } } as EstimateSettings;
    const plan = estimateCompute.plan(s, nitrateVersion());
    expect(Object.keys(plan.requests[0].data).sort()).toEqual(['nitrate_mg_l', 'site']);
    const r = runRequest(plan.requests[0]);
    expect(r.estimate).toBeCloseTo(mean(nitrateSamples().map((x) => x.nitrate_mg_l)), 12);
  });

  it('correlation of nitrate and flow agrees with simple-statistics sampleCorrelation', () => {
    const s = { ...base, filter: null, statistic: { name: 'correlation', x: 'flow_m3_s', y: 'nitrate_mg_l', method: 'pearson' } } as EstimateSettings;
    const r = runRequest(estimateRequest(s, nitrateVersion()).request);
    const rows = nitrateSamples();
    expect(r.estimate).toBeCloseTo(sampleCorrelation(rows.map((x) => x.flow_m3_s), rows.map((x) => x.nitrate_mg_l)), 10);
  });
});
