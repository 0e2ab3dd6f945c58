// Browser: a long run (median of 20,000 readings, B = 100,000) shows a progress bar fed by
// server-sent events (no polling), and Cancel stops it; a shorter B then computes again.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { screenshot, useBrowser } from './support/browser';
import { MemoPage, openDatasets, signInToLab, uploadDataset } from './support/lab-pages';

const app = useBrowser();

describe('a long run in the browser', () => {
  it('streams its progress and can be cancelled', async () => {
    let csv = 'site,nitrate_mg_l\n';
    for (let i = 0; i < 20_000; i++) csv += `${i % 2 ? 'upstream' : 'downstream'},${((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3)}\n`;
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'margin-e2e-long-')), 'long.csv');
    writeFileSync(file, csv);
    const name = `Many readings ${process.pid}`;

    const { page, context } = await app.newPage();
    const labPath = await signInToLab(page, 'tomas@riverside.example');
    await openDatasets(page);
    await uploadDataset(page, file, name);
    const memo = await MemoPage.create(page, labPath, 'A long run');
    await memo.insert('Estimate');
    const est = memo.block('estimate');
    await est.getByLabel('Dataset', { exact: true }).selectOption({ label: name });
    await est.getByRole('checkbox', { name: 'BCa', exact: true }).uncheck();
    await memo.current('estimate');

    const runRequests: string[] = [];
    page.on('request', (r) => {
      const p = new URL(r.url()).pathname;
      if (/^\/api\/runs\/\d+(\/events)?$/.test(p)) runRequests.push(p);
    });
    await est.getByLabel('Replicates B', { exact: true }).fill('100000');
    const bar = est.getByRole('progressbar', { name: 'Computing progress' }).or(est.getByLabel('Computing progress'));
    await bar.waitFor({ timeout: 30_000 });
    await expect.poll(async () => Number(await bar.getAttribute('value')), { timeout: 30_000 }).toBeGreaterThan(0);
    expect(runRequests.some((p) => p.endsWith('/events'))).toBe(true);
    expect(runRequests.filter((p) => !p.endsWith('/events'))).toEqual([]);
    await screenshot(page, 'memo-long-run-progress');

    await est.getByRole('button', { name: 'Cancel' }).click();
    await est.getByRole('alert').filter({ hasText: 'The run was cancelled.' }).waitFor({ timeout: 10_000 });
    await est.getByRole('button', { name: 'Run again' }).waitFor();
    expect(await est.getAttribute('data-run-state')).toBe('failed');
    await screenshot(page, 'memo-long-run-cancelled');

    await est.getByLabel('Replicates B', { exact: true }).fill('3000');
    await memo.current('estimate');
    expect(await est.innerText()).toMatch(/B = 3000/);
    await context.close();
  });
});
