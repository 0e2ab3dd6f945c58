// Browser: the whole Author flow of a memo built from an uploaded CSV. The Author uploads a
// small table through the dataset page, makes a new memo, inserts every block type on it and
// a Live value bound to the Estimate, changes settings and one cell, and watches the blocks
// and the Live value recompute. The point estimates are checked against simple-statistics
// (mean, median of the same numbers): θ̂ itself does not depend on the resampling, so the
// shown digits must agree with it to the precision shown. Screenshots go to
// test-results/screenshots.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { mean, median } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { screenshot, useBrowser } from './support/browser';
import { MemoPage, openDatasets, signInToLab, uploadDataset } from './support/lab-pages';

const app = useBrowser();

// Invented readings (mg/L nitrate as N): twelve visits at each site, upstream and downstream
// of the treatment works, one sample per site per visit.
const UP = [2.14, 1.98, 2.31, 2.05, 2.47, 1.87, 2.22, 2.6, 2.09, 1.95, 2.38, 2.18];
const DOWN = [3.42, 3.05, 3.88, 2.96, 3.61, 3.27, 4.12, 3.15, 3.74, 3.33, 3.5, 2.89];

function csv(): string {
  let s = 'site,sampled_on,nitrate_mg_l\n';
  for (let v = 0; v < UP.length; v++) {
    const day = `2026-04-${String(v + 1).padStart(2, '0')}`;
    s += `upstream,${day},${UP[v].toFixed(2)}\ndownstream,${day},${DOWN[v].toFixed(2)}\n`;
  }
  return s;
}

/**
 * Asserts that a number shown with d decimals is `expected` rounded to d decimals (half a unit
 * in the last place, plus a hair for binary rounding of the expected value).
 */
function agrees(shown: string, expected: number) {
  expect(shown).toMatch(/^-?\d+(\.\d+)?$/);
  const d = shown.split('.')[1]?.length ?? 0;
  expect(Math.abs(Number(shown) - expected)).toBeLessThanOrEqual(0.5 * 10 ** -d + 1e-9);
}

describe('an Author builds a memo from an uploaded CSV', () => {
  it('uploads, inserts every block type and a Live value, and sees settings and a cell edit recompute them', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'margin-e2e-memo-'));
    const file = path.join(dir, 'spring-nitrate.csv');
    writeFileSync(file, csv());
    const name = `Spring nitrate ${process.pid}`;
    const all = [...UP, ...DOWN];

    const { page, context } = await app.newPage();
    const labPath = await signInToLab(page, 'tomas@riverside.example');
    await openDatasets(page);
    await uploadDataset(page, file, name);
    await page.getByText(/Rows 1–\d+ of 24\b/).waitFor();
    await screenshot(page, 'memo-from-upload-dataset');

    const memo = await MemoPage.create(page, labPath, 'Spring nitrate, both sites');
    await page.keyboard.type('Nitrate over both sites, the Estimate: ');
    for (const label of ['Data table', 'Estimate', 'Resample histogram', 'Convergence plot', 'Group comparison']) await memo.insert(label);
    expect(await page.locator('section[data-block-type]').count()).toBe(5);

    // Every block on the uploaded dataset (the lab has others; a new block starts on one of them).
    const table = memo.block('data-table');
    await table.getByLabel('Dataset', { exact: true }).selectOption({ label: name });
    await table.getByRole('table', { name: `${name} v1` }).waitFor();
    const est = memo.block('estimate');
    await est.getByLabel('Dataset', { exact: true }).selectOption({ label: name });
    await est.getByLabel('Statistic', { exact: true }).selectOption('median');
    await est.getByLabel('Column', { exact: true }).selectOption('nitrate_mg_l');
    const gc = memo.block('group-comparison');
    await gc.getByLabel('Dataset', { exact: true }).selectOption({ label: name });
    await gc.getByLabel('Values', { exact: true }).selectOption('nitrate_mg_l');
    await gc.getByLabel('Groups in', { exact: true }).selectOption('site');
    await gc.getByLabel('First group', { exact: true }).selectOption('downstream');
    await gc.getByLabel('Second group', { exact: true }).selectOption('upstream');
    for (const type of ['estimate', 'resample-histogram', 'convergence-plot', 'group-comparison']) await memo.current(type);

    // The Estimate's median, the histogram drawing it, and the group difference, all from the upload.
    await expect.poll(() => est.locator('footer, p').filter({ hasText: `${name} v1` }).count()).toBeGreaterThan(0);
    agrees(await memo.resultCell(est, 'Estimate results', 'Estimate θ̂').innerText(), median(all));
    agrees(await memo.resultCell(gc, 'Difference results', 'Estimate θ̂').innerText(), mean(DOWN) - mean(UP));
    expect(await memo.block('resample-histogram').innerText()).toMatch(/2000 replicates/);

    await memo.insertLiveValue('Estimate θ̂');
    const medianShown = await memo.liveValue();
    agrees(medianShown, median(all));
    await screenshot(page, 'memo-from-upload-every-block');

    // A setting changes: the statistic. The Estimate, its histogram and the Live value follow.
    await est.getByLabel('Statistic', { exact: true }).selectOption('mean');
    const meanShown = await memo.liveValueChangedFrom(medianShown);
    agrees(meanShown, mean(all));
    await expect.poll(() => memo.resultCell(est, 'Estimate results', 'Estimate θ̂').innerText(), { timeout: 30_000 }).toBe(meanShown);
    await expect.poll(() => memo.block('resample-histogram').innerText(), { timeout: 30_000 }).toContain(`θ̂ = ${meanShown}`);

    // Another: B. The Convergence plot now runs to B = 3000 and the SE is recomputed.
    const seBefore = await memo.resultCell(est, 'Estimate results', 'Standard error').innerText();
    await est.getByLabel('Replicates B', { exact: true }).fill('3000');
    await expect.poll(() => memo.block('convergence-plot').innerText(), { timeout: 30_000 }).toMatch(/At B = 3000:/);
    await memo.current('estimate');
    expect(await memo.resultCell(est, 'Estimate results', 'Standard error').innerText()).not.toBe(seBefore);
    await memo.saved();
    await screenshot(page, 'memo-from-upload-settings-changed');

    // The data change: the first upstream reading, 2.14, becomes 6.14 in the Data table. A new
    // version is stored, and the Estimate (mean + 4/24), the Live value and the group
    // difference (down − up, by 4/12 less) recompute from it.
    const diffBefore = await memo.resultCell(gc, 'Difference results', 'Estimate θ̂').innerText();
    await memo.editCell(table, 0, 'nitrate_mg_l', '6.14');
    const edited = [6.14, ...UP.slice(1)];
    const meanAfter = await memo.liveValueChangedFrom(meanShown);
    agrees(meanAfter, mean([...edited, ...DOWN]));
    await expect.poll(() => table.innerText()).toMatch(/v2 \(latest\)/);
    await expect.poll(() => memo.resultCell(gc, 'Difference results', 'Estimate θ̂').innerText(), { timeout: 30_000 }).not.toBe(diffBefore);
    await memo.current('group-comparison');
    agrees(await memo.resultCell(gc, 'Difference results', 'Estimate θ̂').innerText(), mean(DOWN) - mean(edited));
    await expect.poll(() => memo.block('resample-histogram').innerText(), { timeout: 30_000 }).toContain(`θ̂ = ${meanAfter}`);
    await memo.saved();
    await screenshot(page, 'memo-from-upload-cell-edited');

    // Pinning: the Estimate pinned to v1 reads the upload as it was (the earlier mean, from the
    // stored result of the same settings), and its histogram follows; Latest reads v2 again.
    const picker = est.getByLabel('Dataset version');
    const v1 = await picker.locator('option', { hasText: /^Pin v1 / }).getAttribute('value');
    await picker.selectOption(v1!);
    expect(await memo.liveValueChangedFrom(meanAfter)).toBe(meanShown);
    await expect.poll(() => est.innerText(), { timeout: 30_000 }).toContain(`${name} v1 ·`);
    await expect.poll(() => memo.block('resample-histogram').innerText(), { timeout: 30_000 }).toContain(`θ̂ = ${meanShown}`);
    expect(await est.locator('[data-version-pin]').getAttribute('data-version-pin')).toBe('pinned');
    await screenshot(page, 'memo-from-upload-pinned');
    await picker.selectOption('latest');
    expect(await memo.liveValueChangedFrom(meanShown)).toBe(meanAfter);
    await memo.saved();
    await context.close();
  });
});
