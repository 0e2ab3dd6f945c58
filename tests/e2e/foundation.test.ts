// Browser: the first screens — sign-in and the lab home — as a person would use them.
import { describe, expect, it } from 'vitest';
import { screenshot, signIn, useBrowser } from './support/browser';

const app = useBrowser();

describe('sign-in and lab home', () => {
  it('sends a signed-out visitor to sign-in, and rejects a wrong password with a message', async () => {
    const { page, context } = await app.newPage();
    await page.goto('/');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.getByLabel('E-mail').fill('ines@riverside.example');
    await page.getByLabel('Password').fill('wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('do not match');
    await screenshot(page, 'sign-in-rejected');
    await context.close();
  });

  it('shows field errors beside the field for a malformed e-mail', async () => {
    const { page, context } = await app.newPage();
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('not-an-address');
    await page.getByRole('button', { name: 'Sign in' }).click();
    expect(await page.locator('#field-email-error').textContent()).toMatch(/e-mail address/i);
    await context.close();
  });

  it('signs the demo Owner in to the demo lab home, listing members with their roles', async () => {
    const { page, context } = await app.newPage();
    await signIn(page, 'ines@riverside.example');
    await page.getByRole('heading', { name: 'Riverside Water Quality' }).waitFor();
    const members = await page.getByRole('region', { name: 'Members' }).innerText();
    for (const role of ['Owner', 'Author', 'Reviewer', 'Reader']) expect(members).toContain(role);
    await screenshot(page, 'lab-home');
    await context.close();
  });

  it('answers the health check with the database status', async () => {
    const res = await fetch(`${app.baseURL}/api/health`);
    expect(res.status).toBe(200);
    expect((await res.json()).database.status).toBe('up');
  });
});
