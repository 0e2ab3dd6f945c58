// Integration: the demo lab's datasets, seeded from lib/demo/data.ts.
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../support/database';

useTestDatabase();

describe('demo datasets', () => {
  it('seeds the nitrate samples in two versions and the daily series, with the tables of lib/demo/data.ts', async () => {
    const { seedDemo } = await import('@/lib/demo/seed');
    const { listDatasets, loadDatasetVersion } = await import('@/lib/datasets');
    const { nitrateSamples, dailySeries } = await import('@/lib/demo/data');
    const r = await seedDemo();
    const list = await listDatasets(r.labId!);
    expect(list.map((d) => [d.name, d.latest.version, d.latest.rowCount])).toEqual([
      ['Daily downstream series', 1, 120],
      ['Nitrate grab samples', 2, 48],
    ]);
    const samples = await loadDatasetVersion(list[1].latest.id);
    expect(samples.data.nitrate_mg_l).toEqual(nitrateSamples().map((s) => s.nitrate_mg_l));
    expect(samples.data.site).toEqual(nitrateSamples().map((s) => s.site));
    const daily = await loadDatasetVersion(list[0].latest.id);
    expect(daily.columns.map((c) => c.type)).toEqual(['date', 'number', 'number']);
    expect(daily.data.date).toEqual(dailySeries().map((d) => d.date));
  });
});
