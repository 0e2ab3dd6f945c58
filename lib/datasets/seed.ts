import 'server-only';
import { dailySeries, nitrateSamples, toCsv } from '@/lib/demo/data';
import type { SeedStep } from '@/lib/demo/seed';
import { importCsv } from './ingest';

async function* bytesOf(text: string) {
  yield new TextEncoder().encode(text);
}

/**
 * The demo lab's datasets, from the invented tables of lib/demo/data.ts, added by the lab's
 * Author: the nitrate grab samples in two versions (visits 1–8, then all 12 visits, so the
 * version history has something to show) and the daily downstream series.
 */
export const seedDatasets: SeedStep = async ({ labId, userIds }) => {
  const author = userIds[1] ?? userIds[0];
  const samples = nitrateSamples();
  const first = await importCsv({ labId, userId: author, name: 'Nitrate grab samples', body: bytesOf(toCsv(samples.filter((r) => r.visit <= 8))), source: { kind: 'seed', fileName: 'nitrate-samples.csv' } });
  await importCsv({ labId, userId: author, datasetId: first.datasetId, body: bytesOf(toCsv(samples)), source: { kind: 'seed', fileName: 'nitrate-samples.csv' } });
  await importCsv({ labId, userId: author, name: 'Daily downstream series', body: bytesOf(toCsv(dailySeries())), source: { kind: 'seed', fileName: 'daily-downstream.csv' } });
};
