// Group comparison: the three engine requests and their answers, against simple-statistics.
import { mean, median } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { nitrateSamples } from '@/lib/demo/data';
import { runRequest } from '@/lib/resampling';
import { nitrateVersion } from '../shared/test-fixtures';
import { groupComparisonCompute } from './compute';
import { groupComparison } from './index';
import { groupComparisonSettings, type GroupComparisonSettings } from './schema';

const s: GroupComparisonSettings = {
  dataset: { datasetId: 7, versionId: null },
  value: 'nitrate_mg_l',
  group: 'site',
  levels: ['downstream', 'upstream'],
  statistic: 'mean',
  B: 500,
  seed: 'groups',
  level: 0.9,
  method: 'percentile',
};
const rows = nitrateSamples();
const down = rows.filter((r) => r.site === 'downstream').map((r) => r.nitrate_mg_l);
const up = rows.filter((r) => r.site === 'upstream').map((r) => r.nitrate_mg_l);

describe('group comparison', () => {
  it('refuses the same group twice and a value column used as groups', () => {
    expect(groupComparisonSettings.safeParse({ ...s, levels: ['upstream', 'upstream'] }).error!.issues[0].path).toEqual(['levels', 1]);
    expect(groupComparisonSettings.safeParse({ ...s, group: 'nitrate_mg_l' }).error!.issues[0].path).toEqual(['group']);
  });

  it('resamples within each group for the difference, and gives each group its own interval', () => {
    const plan = groupComparisonCompute.plan(s, nitrateVersion());
    expect(plan.requests).toHaveLength(3);
    expect(plan.requests[0].scheme).toEqual({ name: 'stratified', by: 'group' });
    expect(plan.requests[0].statistic).toEqual({ name: 'mean-difference', column: 'value', group: 'group', levels: ['downstream', 'upstream'] });
    const out = plan.finish(plan.requests.map((r) => runRequest(r)));
    expect(out.difference.estimate).toBeCloseTo(mean(down) - mean(up), 12);
    expect(out.groups[0].response.estimate).toBeCloseTo(mean(down), 12);
    expect(out.groups[1].response.estimate).toBeCloseTo(mean(up), 12);
    expect(out.groups.map((g) => g.n)).toEqual([24, 24]);
    expect(out.groups[0].values).toEqual(down);
    const iv = out.difference.intervals.percentile!;
    expect(iv.level).toBe(0.9);
    expect(iv.lower!).toBeLessThan(out.difference.estimate);
    // Live values read these outputs.
    expect(groupComparison.pick!(out, 'difference')).toEqual({ kind: 'number', value: out.difference.estimate, se: out.difference.se });
    expect(groupComparison.pick!(out, 'difference-interval')).toMatchObject({ kind: 'interval', lower: iv.lower, upper: iv.upper });
  });

  it('uses the median difference when asked (simple-statistics median)', () => {
    const plan = groupComparisonCompute.plan({ ...s, statistic: 'median' }, nitrateVersion());
    expect(runRequest(plan.requests[0]).estimate).toBeCloseTo(median(down) - median(up), 12);
  });

  it('names the group that has no rows', () => {
    expect(() => groupComparisonCompute.plan({ ...s, levels: ['downstream', 'estuary'] }, nitrateVersion())).toThrow(expect.objectContaining({ path: 'levels.1', message: expect.stringContaining('"estuary"') }));
  });
});
