// Page objects shared by the browser tests: the lab, its datasets page and a memo in the
// editor. They wait on visible state (URLs, roles, data-* attributes the views expose),
// never on fixed sleeps.
import type { Locator, Page } from 'playwright-core';
import { signIn } from './browser';

/** Signs in and returns the first lab's path (the home page sends members to their first lab). */
export async function signInToLab(page: Page, email: string): Promise<string> {
  await signIn(page, email);
  await page.goto('/');
  await page.waitForURL(/\/labs\/\d+/);
  return new URL(page.url()).pathname.match(/^\/labs\/\d+/)![0];
}

export async function openDatasets(page: Page) {
  await page.getByRole('navigation', { name: 'Lab sections' }).getByRole('link', { name: 'Datasets' }).click();
  await page.getByRole('heading', { name: 'Datasets', level: 2 }).waitFor();
}

/**
 * Uploads a file as a new dataset through the upload panel (preview, then Create dataset)
 * and waits for its page; returns the dataset id from the URL.
 */
export async function uploadDataset(page: Page, file: string, name: string): Promise<number> {
  await page.getByRole('button', { name: 'Add a dataset' }).click();
  await page.getByLabel('CSV file').setInputFiles(file);
  await page.getByRole('table', { name: 'Preview of the first rows' }).waitFor();
  await page.getByLabel('Dataset name').fill(name);
  await page.getByRole('button', { name: 'Create dataset' }).click();
  await page.waitForURL(/\/datasets\/\d+\?v=1$/, { timeout: 60_000 });
  await page.getByRole('heading', { name }).waitFor();
  return Number(new URL(page.url()).pathname.match(/\/datasets\/(\d+)/)![1]);
}

/** A memo open in the editor. */
export class MemoPage {
  constructor(readonly page: Page) {}

  /** Creates a new memo from the lab's memo list and waits for the editor. */
  static async create(page: Page, labPath: string, title: string): Promise<MemoPage> {
    await page.goto(`${labPath}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    await page.getByLabel('Memo title').fill(title);
    await page.getByLabel('Memo text').click();
    return new MemoPage(page);
  }

  /** The last block of a type (the one just inserted), or a block by its id. */
  block(type: string): Locator {
    return this.page.locator(`section[data-block-type="${type}"]`).last();
  }

  async insert(label: string) {
    await this.page.getByRole('button', { name: 'Insert block' }).click();
    await this.page.getByRole('menuitem', { name: new RegExp(`^${label}`) }).click();
  }

  /** Waits until the block of this type shows a current result. */
  async current(type: string, timeout = 30_000) {
    await this.page.locator(`section[data-block-type="${type}"][data-run-state="current"]`).last().waitFor({ timeout });
  }

  /** Places a Live value at the end of the first paragraph, showing `output` of the first block offering it. */
  async insertLiveValue(output: string) {
    await this.page.locator('.ProseMirror p').first().click();
    await this.page.keyboard.press('End');
    await this.page.getByRole('button', { name: 'Live value' }).click();
    await this.page.getByRole('menuitem', { name: output }).first().click();
  }

  /** The text of the first Live value in the memo's text once it is not stale. */
  async liveValue(timeout = 30_000): Promise<string> {
    const el = this.page.locator('.ProseMirror p span[data-live-value][data-stale="false"]').first();
    await el.waitFor({ timeout });
    return (await el.innerText()).trim();
  }

  /** Waits until the first Live value is fresh and differs from `previous`; returns it. */
  async liveValueChangedFrom(previous: string, timeout = 30_000): Promise<string> {
    const handle = await this.page.waitForFunction(
      (prev) => {
        const el = document.querySelector('.ProseMirror p span[data-live-value]');
        const text = el?.textContent?.trim();
        return el && el.getAttribute('data-stale') === 'false' && text !== prev ? text : null;
      },
      previous,
      { timeout },
    );
    return (await handle.jsonValue()) as string;
  }

  /** One row of a block's result table (e.g. "Estimate θ̂" in "Difference results"). */
  resultCell(block: Locator, table: string, row: string): Locator {
    return block.getByRole('table', { name: table }).locator(`td[data-output="${row}"]`);
  }

  async saved() {
    await this.page.locator('[data-save-status="saved"]').waitFor({ timeout: 10_000 });
  }

  /** Edits one cell of a Data table block (0-based row and column of the data). */
  async editCell(table: Locator, row: number, column: string, value: string) {
    const header = await table.locator('thead th').allInnerTexts();
    const col = header.findIndex((h) => h.startsWith(column)) - 1;
    await table.locator(`td[data-cell="${row}:${col}"]`).dblclick();
    const input = table.getByLabel(`Row ${row + 1}, ${column}`);
    await input.fill(value);
    await input.press('Enter');
  }
}
