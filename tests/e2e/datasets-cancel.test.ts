// Browser: an Author starts uploading a CSV and presses Cancel upload while it is being read;
// the page says nothing was stored, and after a reload the dataset is not in the lab.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { screenshot, useBrowser } from './support/browser';
import { openDatasets, signInToLab, uploadDataset } from './support/lab-pages';

const app = useBrowser();
const ROWS = 400_000;

describe('cancelling an upload in the browser', () => {
  it('aborts the upload and stores nothing', async () => {
    let csv = 'site,sample_id,nitrate_mg_l\n';
    for (let i = 0; i < ROWS; i++) csv += `${i % 2 ? 'upstream' : 'downstream'},S${String(i).padStart(7, '0')},${((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3)}\n`;
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'margin-e2e-cancel-')), 'cancelled.csv');
    writeFileSync(file, csv);

    const { page, context } = await app.newPage();
    await signInToLab(page, 'tomas@riverside.example');
    await openDatasets(page);
    await page.getByRole('button', { name: 'Add a dataset' }).click();
    await page.getByLabel('CSV file').setInputFiles(file);
    await page.getByRole('table', { name: 'Preview of the first rows' }).waitFor();
    await page.getByLabel('Dataset name').fill('Cancelled upload');
    await page.getByRole('button', { name: 'Create dataset' }).click();
    // The button appears as soon as the upload starts; pressing it aborts the request.
    await page.getByRole('button', { name: 'Cancel upload' }).click();
    await page.getByRole('alert').filter({ hasText: 'Upload cancelled. Nothing was stored.' }).waitFor();
    expect(page.url()).toMatch(/\/datasets$/);
    await screenshot(page, 'datasets-upload-cancelled');

    // The server stopped too. Had it gone on and stored the file, uploading it again under the
    // same name would be refused (the name taken, or the unique index at commit); instead it is
    // stored as version 1 of a new dataset, the only one of that name.
    await page.reload();
    expect(await page.getByRole('link', { name: 'Cancelled upload' }).count()).toBe(0);
    await uploadDataset(page, file, 'Cancelled upload');
    expect(await page.getByText(/^Version 1 of 1/).count()).toBe(1);
    await openDatasets(page);
    expect(await page.getByRole('link', { name: 'Cancelled upload' }).count()).toBe(1);
    await context.close();
  });
});
