// One headless Chromium per test file (Debian's /usr/bin/chromium through playwright-core).
import { mkdirSync } from 'node:fs';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';

const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'];

export function useBrowser() {
  let browser: Browser;
  const state = { baseURL: inject('baseURL') };
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: FLAGS });
  });
  afterAll(async () => {
    await browser?.close();
  });
  return {
    baseURL: state.baseURL,
    async newPage(): Promise<{ context: BrowserContext; page: Page }> {
      const context = await browser.newContext({ baseURL: state.baseURL, viewport: { width: 1280, height: 860 } });
      const page = await context.newPage();
      return { context, page };
    },
  };
}

/** Saves a screenshot under test-results/screenshots (kept as a CI artifact). */
export async function screenshot(page: Page, name: string) {
  mkdirSync('test-results/screenshots', { recursive: true });
  await page.screenshot({ path: `test-results/screenshots/${name}.png`, fullPage: true });
}

/** Signs in through the real sign-in form. */
export async function signIn(page: Page, email: string, password = 'margin-demo') {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}
