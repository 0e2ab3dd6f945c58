// Browser: uploading a CSV, watching its progress, reading the table; bad files named by line.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, signIn, useBrowser } from './support/browser';

const app = useBrowser();
const dir = mkdtempSync(path.join(tmpdir(), 'margin-e2e-datasets-'));

const ROWS = 200_000;
/** Row i of the generated file: a site, a sample id, a nitrate reading in mg/L. */
const nitrate = (i: number) => ((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3);

function writeCsv(name: string, text: string | Uint8Array): string {
  const file = path.join(dir, name);
  writeFileSync(file, text);
  return file;
}

async function openDatasets(page: Page) {
  await page.getByRole('navigation', { name: 'Lab sections' }).getByRole('link', { name: 'Datasets' }).click();
  await page.getByRole('heading', { name: 'Datasets', level: 2 }).waitFor();
}

/** Records every value the progress bar takes, from before the upload starts. */
async function watchProgress(page: Page) {
  await page.evaluate(() => {
    const seen: number[] = [];
    (window as unknown as { __progress: number[] }).__progress = seen;
    new MutationObserver(() => {
      const bar = document.querySelector('[role="progressbar"]');
      if (bar) seen.push(Number(bar.getAttribute('aria-valuenow')));
    }).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['aria-valuenow'] });
  });
}

describe('datasets in the browser', () => {
  it('uploads a 200,000-row CSV with a progress bar, then shows the table, its summaries and version 1', async () => {
    let csv = 'site,sample_id,nitrate_mg_l\n';
    for (let i = 0; i < ROWS; i++) csv += `${i % 2 ? 'upstream' : 'downstream'},S${String(i).padStart(6, '0')},${nitrate(i)}\n`;
    const file = writeCsv('river-nitrate.csv', csv);

    const { page, context } = await app.newPage();
    await signIn(page, 'tomas@riverside.example');
    await openDatasets(page);
    // The demo lab's seeded datasets are listed.
    await page.getByRole('link', { name: 'Nitrate grab samples' }).waitFor();

    await page.getByRole('button', { name: 'Add a dataset' }).click();
    await page.getByLabel('CSV file').setInputFiles(file);
    // The guesses, over a preview of the first rows.
    await page.getByRole('table', { name: 'Preview of the first rows' }).waitFor();
    expect(await page.getByLabel('Delimiter').inputValue()).toBe(',');
    expect(await page.getByLabel('First line holds column names').isChecked()).toBe(true);
    expect(await page.getByLabel('Dataset name').inputValue()).toBe('river-nitrate');
    await screenshot(page, 'datasets-upload-preview');

    await watchProgress(page);
    await page.getByRole('button', { name: 'Create dataset' }).click();
    await page.waitForURL(/\/datasets\/\d+\?v=1$/, { timeout: 60_000 });
    const seen = await page.evaluate(() => (window as unknown as { __progress: number[] }).__progress);
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.some((v) => v > 0 && v < 100)).toBe(true);

    await page.getByRole('heading', { name: 'river-nitrate' }).waitFor();
    const grid = page.getByRole('table', { name: 'Dataset rows' });
    await grid.getByRole('cell', { name: 'S000000' }).waitFor();
    expect(await page.getByText(/Rows 1–\d+ of 200,000/).count()).toBe(1);
    // The windowed table jumps far down without loading everything in between.
    await page.getByLabel('Go to row').fill('150000');
    await page.getByLabel('Go to row').press('Enter');
    await grid.getByRole('cell', { name: 'S149999' }).waitFor();
    expect(await grid.getByRole('row').count()).toBeLessThan(60);
    const summary = await page.getByRole('listitem', { name: 'Column nitrate_mg_l' }).innerText();
    expect(summary).toMatch(/no missing values/);
    expect(summary).toMatch(/median/);
    await page.getByRole('region', { name: 'Versions' }).getByText('Version 1').waitFor();
    await screenshot(page, 'datasets-table');
    await context.close();
  });

  it('names the line of a ragged row, and says what a binary file is, storing neither', async () => {
    const { page, context } = await app.newPage();
    await signIn(page, 'tomas@riverside.example');
    await openDatasets(page);
    await page.getByRole('button', { name: 'Add a dataset' }).click();

    await page.getByLabel('CSV file').setInputFiles(writeCsv('ragged.csv', 'site,nitrate_mg_l\nup,2.1\ndown,3.4\nup,2.2\ndown,3.1\nup,2.0\nup,2.4,extra\n'));
    await page.getByLabel('Dataset name').fill('Ragged upload');
    await page.getByRole('button', { name: 'Create dataset' }).click();
    await page.getByRole('alert').filter({ hasText: 'Line 7 has 3 fields, but line 1 has 2' }).waitFor();
    await screenshot(page, 'datasets-bad-line');

    await page.getByLabel('CSV file').setInputFiles(writeCsv('photo.csv', new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13])));
    await page.getByLabel('Dataset name').fill('Not a table');
    await page.getByRole('button', { name: 'Create dataset' }).click();
    await page.getByRole('alert').filter({ hasText: 'it looks like a PNG image' }).waitFor();

    await page.reload();
    expect(await page.getByRole('link', { name: 'Ragged upload' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Not a table' }).count()).toBe(0);
    await context.close();
  });

  it('pastes a semicolon table with decimal commas as a new version, and lets a Reader only look', async () => {
    const { page, context } = await app.newPage();
    await signIn(page, 'tomas@riverside.example');
    await openDatasets(page);
    await page.getByRole('link', { name: 'Daily downstream series' }).click();
    await page.getByRole('button', { name: 'Upload a new version' }).click();
    await page.getByRole('tab', { name: 'Paste a table' }).click();
    await page.getByLabel(/^Table/).fill('date;nitrate_mg_l;rain_mm\n2026-03-01;2,81;0\n2026-03-02;2,95;4,5\n');
    expect(await page.getByLabel('Delimiter').inputValue()).toBe(';');
    expect(await page.getByLabel('Decimal mark').inputValue()).toBe(',');
    await page.getByRole('button', { name: 'Store as new version' }).click();
    await page.waitForURL(/\?v=2$/);
    await page.getByRole('table', { name: 'Dataset rows' }).getByRole('cell', { name: '2.95' }).waitFor();
    expect(await page.getByText(/^Version 2 of 2/).count()).toBe(1);
    await context.close();

    const reader = await app.newPage();
    await signIn(reader.page, 'jonah@riverside.example');
    await openDatasets(reader.page);
    expect(await reader.page.getByRole('button', { name: 'Add a dataset' }).count()).toBe(0);
    await reader.page.getByRole('link', { name: 'Daily downstream series' }).click();
    await reader.page.getByRole('table', { name: 'Dataset rows' }).waitFor();
    expect(await reader.page.getByRole('button', { name: 'Upload a new version' }).count()).toBe(0);
    await reader.context.close();
  });
});
