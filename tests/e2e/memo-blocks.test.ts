// Browser: an Author opens the demo memo, changes settings and data, and watches blocks and
// Live values recompute; then builds a new memo with every block type. Screenshots are
// saved under test-results/screenshots.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, signIn, useBrowser } from './support/browser';

const app = useBrowser();

const block = (page: Page, id: string) => page.locator(`section[data-block-id="${id}"]`);
const live = (page: Page, id: string, output: string) => page.locator(`span[data-live-value][data-block="${id}"][data-output="${output}"]`).first();
const current = (page: Page, id: string) => page.locator(`section[data-block-id="${id}"][data-run-state="current"]`).waitFor({ timeout: 30_000 });
const fresh = async (page: Page, id: string, output: string) => {
  await page.locator(`span[data-live-value][data-block="${id}"][data-output="${output}"][data-stale="false"]`).first().waitFor({ timeout: 30_000 });
  return (await live(page, id, output).innerText()).trim();
};

/** Signs in and returns the demo lab's path (the home page sends members to their first lab). */
async function signInToLab(page: Page, email: string) {
  await signIn(page, email);
  await page.goto('/');
  await page.waitForURL(/\/labs\/\d+/);
  return new URL(page.url()).pathname.match(/^\/labs\/\d+/)![0];
}

async function openDemoMemo(page: Page, email = 'tomas@riverside.example') {
  const labPath = await signInToLab(page, email);
  await page.goto(`${labPath}/memos`);
  await page.getByRole('link', { name: 'Nitrate below the treatment works' }).click();
  await page.waitForURL(/\/memos\/\d+$/);
  return labPath;
}

describe('memo with live blocks', () => {
  it('opens the demo memo with every block current and Live values filled in', async () => {
    const { page, context } = await app.newPage();
    await openDemoMemo(page);
    for (const id of ['demo-median', 'demo-histogram', 'demo-convergence', 'demo-sites', 'demo-daily']) await current(page, id);
    const median = await fresh(page, 'demo-median', 'estimate');
    expect(median).toMatch(/^\d+\.\d+$/);
    expect(await fresh(page, 'demo-median', 'interval:bca')).toMatch(/^\d+\.\d+ to \d+\.\d+$/);
    expect(await fresh(page, 'demo-sites', 'difference')).toMatch(/^-?\d+\.\d+$/);
    // The standing caution and the Estimate's warnings section are there.
    await expect.poll(() => page.getByRole('note', { name: 'Caution about resampling results' }).innerText()).toMatch(/qualified statistician/);
    expect(await block(page, 'demo-median').getByRole('note', { name: 'Warnings' }).count()).toBe(1);
    // The headline number in the block agrees with the Live value in the text.
    expect(await block(page, 'demo-median').getByTestId('estimate-headline').innerText()).toContain(median);
    await screenshot(page, 'memo-demo-open');
    await context.close();
  });

  it('recomputes the Estimate, its histogram and Live values when B changes', async () => {
    const { page, context } = await app.newPage();
    await openDemoMemo(page);
    await current(page, 'demo-median');
    const seRow = () => block(page, 'demo-median').locator('td[data-output="Standard error"]').innerText();
    const seBefore = await seRow();
    const b = block(page, 'demo-median').getByLabel('Replicates B', { exact: true });
    await b.fill('3000');
    await page.locator('section[data-block-id="demo-median"] p', { hasText: 'B = 3000' }).first().waitFor({ timeout: 30_000 });
    await current(page, 'demo-median');
    await current(page, 'demo-histogram');
    expect(await fresh(page, 'demo-median', 'se')).toMatch(/^\d+\.\d+$/);
    // More replicates: the SE's Monte Carlo error shrinks (about SE/√(2B)), so the row changes.
    const seAfter = await seRow();
    expect(seAfter).toMatch(/Monte Carlo error/);
    expect(seAfter).not.toBe(seBefore);
    await expect.poll(() => page.locator('[data-save-status]').getAttribute('data-save-status'), { timeout: 10_000 }).toBe('saved');
    await screenshot(page, 'memo-demo-b-changed');
    // Bad input is named and nothing runs.
    await b.fill('20');
    await expect.poll(() => block(page, 'demo-median').innerText()).toMatch(/B must be at least 100/);
    await b.fill('3000');
    await current(page, 'demo-median');
    await context.close();
  });

  it('recomputes every block following the data when a Data table cell is edited', async () => {
    const { page, context } = await app.newPage();
    await openDemoMemo(page);
    await current(page, 'demo-median');
    const before = await fresh(page, 'demo-sites', 'difference');
    // Row 3 of the grab samples is the first downstream reading (visit 1): make it very high.
    const table = block(page, 'demo-table');
    const header = await table.locator('thead th').allInnerTexts();
    const col = header.findIndex((h) => h.startsWith('nitrate_mg_l')) - 1;
    const site = header.findIndex((h) => h.startsWith('site')) - 1;
    expect(await table.locator(`td[data-cell="2:${site}"]`).innerText()).toBe('downstream');
    const t0 = Date.now();
    await table.locator(`td[data-cell="2:${col}"]`).dblclick();
    await table.getByLabel(/Row 3, nitrate_mg_l/).fill('25');
    await table.getByLabel(/Row 3, nitrate_mg_l/).press('Enter');
    await page.waitForFunction((prev) => {
      const el = document.querySelector('span[data-live-value][data-block="demo-sites"][data-output="difference"]');
      return el && el.getAttribute('data-stale') === 'false' && el.textContent!.trim() !== prev;
    }, before, { timeout: 30_000 });
    const took = Date.now() - t0;
    const after = (await live(page, 'demo-sites', 'difference').innerText()).trim();
    // One downstream value up by about 20 mg/L moves the mean difference up by about 20/24.
    expect(Number(after) - Number(before)).toBeGreaterThan(0.5);
    await expect.poll(() => table.innerText()).toMatch(/v3 \(latest\)/);
    console.log(`[e2e] cell edit → Group comparison Live value updated in ${took} ms`);
    await screenshot(page, 'memo-demo-cell-edited');
    await context.close();
  });

  it('builds a new memo with every block type and a Live value', async () => {
    const { page, context } = await app.newPage();
    const labPath = await signInToLab(page, 'tomas@riverside.example');
    await page.goto(`${labPath}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    await page.getByLabel('Memo title').fill('Spring survey');
    await page.getByLabel('Memo text').click();
    await page.keyboard.type('Median nitrate this spring: ');
    const insert = async (label: string) => {
      await page.getByRole('button', { name: 'Insert block' }).click();
      await page.getByRole('menuitem', { name: new RegExp(`^${label}`) }).click();
    };
    for (const label of ['Data table', 'Estimate', 'Resample histogram', 'Convergence plot', 'Group comparison']) await insert(label);
    await screenshot(page, 'memo-new-inserted');
    for (const type of ['estimate', 'resample-histogram', 'convergence-plot']) await page.locator(`section[data-block-type="${type}"][data-run-state="current"]`).waitFor({ timeout: 30_000 });
    await page.locator('section[data-block-type="data-table"] table').waitFor();
    // The Group comparison starts with the first text column's first two values as groups.
    const gc = page.locator('section[data-block-type="group-comparison"]');
    await gc.getByLabel('Dataset', { exact: true }).selectOption({ label: 'Nitrate grab samples' });
    await gc.getByLabel('Values', { exact: true }).selectOption('nitrate_mg_l');
    await gc.getByLabel('Groups in', { exact: true }).selectOption('site');
    await page.locator('section[data-block-type="group-comparison"][data-run-state="current"]').waitFor({ timeout: 30_000 });
    // A Live value of the Estimate's median, placed in the first sentence.
    await page.locator('.ProseMirror p').first().click();
    await page.keyboard.press('End');
    await page.getByRole('button', { name: 'Live value' }).click();
    await page.getByRole('menuitem', { name: 'Estimate θ̂' }).first().click();
    const value = page.locator('.ProseMirror p span[data-live-value][data-stale="false"]').first();
    await value.waitFor({ timeout: 20_000 });
    const shown = (await value.innerText()).trim();
    expect(shown).toMatch(/^\d+(\.\d+)?$/);
    // Changing the statistic recomputes and the Live value follows.
    const est = page.locator('section[data-block-type="estimate"]');
    await est.getByLabel('Statistic', { exact: true }).selectOption('mean');
    await page.waitForFunction((prev) => {
      const el = document.querySelector('.ProseMirror p span[data-live-value]');
      return el && el.getAttribute('data-stale') === 'false' && el.textContent!.trim() !== prev;
    }, shown, { timeout: 30_000 });
    await expect.poll(() => page.locator('[data-save-status]').getAttribute('data-save-status'), { timeout: 10_000 }).toBe('saved');
    await screenshot(page, 'memo-new-every-block');
    // Reload: the memo was saved with its blocks, and results come with the page.
    await page.reload();
    await page.locator('section[data-block-type="estimate"][data-run-state="current"]').waitFor({ timeout: 20_000 });
    expect(await page.locator('section[data-block-type]').count()).toBe(5);
    await expect.poll(() => page.getByLabel('Memo title').inputValue()).toBe('Spring survey');
    await context.close();
  });

  it('shows a Reader the results read-only, and finds memos by their text', async () => {
    const { page, context } = await app.newPage();
    const labPath = await signInToLab(page, 'jonah@riverside.example');
    await page.goto(`${labPath}/memos`);
    await page.getByLabel('Search memos').fill('consecutive days');
    await expect.poll(() => page.getByRole('list', { name: 'Memos' }).innerText()).toContain('Nitrate below the treatment works');
    await page.getByLabel('Search memos').fill('no such words here');
    await expect.poll(() => page.getByRole('list', { name: 'Memos' }).innerText()).toMatch(/No memo mentions/);
    expect(await page.getByRole('button', { name: 'New memo' }).count()).toBe(0);
    await page.getByLabel('Search memos').fill('');
    await page.getByRole('link', { name: 'Nitrate below the treatment works' }).click();
    await current(page, 'demo-median');
    expect(await page.getByRole('button', { name: 'Insert block' }).count()).toBe(0);
    expect(await block(page, 'demo-median').getByLabel('Replicates B', { exact: true }).isDisabled()).toBe(true);
    await screenshot(page, 'memo-reader');
    await context.close();
  });
});
