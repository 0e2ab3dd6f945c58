// Browser: the whole path of a new team — sign up, confirm the address from the development
// mailbox, create a lab, invite a colleague, read the invitation in the mailbox, accept it as
// a new account — and the colleague sees the lab with the invited role and no Owner tools.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, useBrowser } from './support/browser';

const app = useBrowser();

/** Opens the newest captured message to `email` and returns the first app link in its plain-text part. */
async function linkFromMailbox(page: Page, email: string, subject: RegExp): Promise<string> {
  await page.goto('/dev/mailbox');
  const row = page.locator('tr', { hasText: email }).filter({ hasText: subject }).first();
  await row.getByRole('link').click();
  await page.getByRole('heading', { name: 'Plain-text part' }).waitFor();
  const text = await page.locator('pre').innerText();
  const m = text.match(/http:\/\/127\.0\.0\.1:\d+\/\S+/);
  if (!m) throw new Error(`no link in the captured message:\n${text}`);
  return m[0];
}

describe('sign up, create a lab, invite a colleague', () => {
  it('takes a new Owner and an invited Reviewer through to the lab', async () => {
    const stamp = Date.now().toString(36);
    const ownerEmail = `hana-${stamp}@estuary.example`;
    const colleagueEmail = `luis-${stamp}@estuary.example`;
    const labName = `Estuary <nitrate> & flow ${stamp}`;

    const { page, context } = await app.newPage();
    await page.goto('/sign-up');
    await page.getByRole('button', { name: 'Create account' }).click();
    expect(await page.locator('#field-email-error').textContent()).toMatch(/e-mail address/i);
    await page.getByLabel('Your name').fill('Hana Reyes');
    await page.getByLabel('E-mail').fill(ownerEmail);
    await page.getByLabel('Password').fill('estuary-survey-2026');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL('**/labs/new');
    expect(await page.getByRole('note').innerText()).toContain('Confirm your e-mail address');

    // Confirm the address from the development mailbox.
    await page.goto(await linkFromMailbox(page, ownerEmail, /Confirm your e-mail/));
    await page.getByRole('button', { name: 'Confirm my address' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('confirmed');

    // Create the lab; its name is shown as text, markup and all.
    await page.goto('/labs/new');
    await page.getByLabel('Lab name').fill(labName);
    await page.getByRole('button', { name: 'Create lab' }).click();
    await page.waitForURL(/\/labs\/\d+\/members$/);
    await page.getByRole('heading', { name: labName }).waitFor();
    const labPath = new URL(page.url()).pathname.replace(/\/members$/, '');

    // Invite a colleague as Reviewer.
    await page.getByLabel('E-mail address').fill(colleagueEmail);
    await page.getByLabel('Role', { exact: true }).selectOption('reviewer');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByRole('region', { name: 'Invite a colleague' }).getByRole('status').textContent()).toContain(`Invitation sent to ${colleagueEmail}`);
    await page.getByText(colleagueEmail).first().waitFor();
    await screenshot(page, 'auth-members-owner');
    const invitationLink = await linkFromMailbox(page, colleagueEmail, /invited you to/);
    await screenshot(page, 'auth-mailbox-invitation');
    expect(invitationLink).toMatch(/\/invitations\/[A-Za-z0-9_-]{43}$/);

    // The colleague, in a browser of their own, accepts as a new account.
    const other = await app.newPage();
    await other.page.goto(invitationLink);
    await other.page.getByRole('heading', { name: `Join ${labName}` }).waitFor();
    await other.page.getByLabel('Your name').fill('Luis Amaro');
    await other.page.getByLabel('Choose a password').fill('downstream-readings');
    await other.page.getByRole('button', { name: 'Create account and join' }).click();
    await other.page.waitForURL((u) => u.pathname === labPath);
    await other.page.getByRole('heading', { name: labName }).waitFor();
    expect(await other.page.getByText(/You are\s+Reviewer\s+here/).count()).toBe(1);

    // As a Reviewer: the members page has no Owner tools, the audit trail is not there.
    await other.page.goto(`${labPath}/members`);
    await other.page.getByRole('heading', { name: /Members/ }).waitFor();
    expect(await other.page.getByRole('button', { name: 'Send invitation' }).count()).toBe(0);
    expect(await other.page.getByRole('combobox').count()).toBe(0);
    const audit = await other.page.goto(`${labPath}/audit`);
    expect(audit?.status()).toBe(404);
    // The used link does not work a second time.
    await other.page.goto(invitationLink);
    expect(await other.page.getByRole('status').innerText()).toMatch(/already been used/);
    await other.context.close();

    // The Owner sees the colleague as Reviewer, and the events in the audit trail.
    await page.goto(`${labPath}/members`);
    await page.locator(`tr[data-member="${colleagueEmail}"]`).waitFor();
    expect(await page.locator(`tr[data-member="${colleagueEmail}"] select`).inputValue()).toBe('reviewer');
    await page.goto(`${labPath}/audit`);
    const trail = await page.getByRole('region', { name: 'Audit trail' }).innerText();
    expect(trail).toContain(`invited ${colleagueEmail} as Reviewer`);
    expect(trail).toContain('accepted the invitation as Reviewer');
    await screenshot(page, 'auth-audit-trail');
    await context.close();
  });
});
