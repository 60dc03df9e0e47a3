/**
 * The demo accounts sign in through the browser, each sees only the navigation its role
 * may use, and signs out again; the form is driven with the keyboard.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newLocalContext, screenshot } from './support/browser';
import { appUrl, signIn, type DemoRole } from './support/session';

const everyone = ['Overview', 'Sites', 'Profiles', 'Plans', 'Studies'];
const demo: readonly { role: DemoRole; nav: readonly string[] }[] = [
  { role: 'viewer', nav: everyone },
  { role: 'planner', nav: everyone },
  { role: 'approver', nav: [...everyone, 'Sign-off'] },
  { role: 'admin', nav: [...everyone, 'Sign-off', 'Users', 'Audit', 'Mail outbox'] },
];

async function navLabels(page: Page) {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await nav.getByRole('link').first().waitFor();
  return nav.getByRole('link').allInnerTexts();
}

describe('signing in with the demo accounts', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('sends an anonymous visitor to the sign-in page, which shows the error for a wrong password', async () => {
    const { context, offsite } = await newLocalContext(browser);
    const page = await context.newPage();
    await page.goto(appUrl('/users'));
    await page.waitForURL(/\/sign-in\?next=%2Fusers$/);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.evaluate(() => document.fonts.ready);
    await screenshot(page, 'sign-in');
    await page.getByLabel('E-mail address').fill('viewer@slackwater.example');
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/e-mail address or the password is wrong/);
    await screenshot(page, 'sign-in-wrong-password');
    await page.setViewportSize({ width: 420, height: 860 });
    await screenshot(page, 'sign-in-narrow');
    expect(offsite).toEqual([]);
    await context.close();
  });

  for (const account of demo) {
    it(`the demo ${account.role} signs in with the keyboard, sees ${account.nav.length} navigation links, and signs out`, async () => {
      const { context, offsite } = await newLocalContext(browser);
      const page = await context.newPage();
      await signIn(page, account.role);
      expect(await navLabels(page)).toEqual([...account.nav]);
      await screenshot(page, `home-${account.role}`);

      await page.getByRole('button', { name: /Account menu/ }).click();
      await expect(page.getByText(`Signed in as ${account.role}@slackwater.example`).isVisible()).resolves.toBe(true);
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL(/\/sign-in$/);
      await page.goto(appUrl('/'));
      await page.waitForURL(/\/sign-in$/);
      expect(offsite).toEqual([]);
      await context.close();
    });
  }

  it('opens the admin pages for the admin, after sign-in on the page first asked for', async () => {
    const { context } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'admin', '/users');
    await page.waitForURL(/\/users$/);
    await page.getByRole('heading', { name: 'Users' }).waitFor();
    await page.getByRole('cell', { name: 'planner@slackwater.example', exact: true }).waitFor();
    await screenshot(page, 'users-admin');
    await page.getByRole('link', { name: 'Audit' }).click();
    await page.getByRole('heading', { name: 'Audit trail' }).waitFor();
    await page.getByRole('cell', { name: 'auth.sign_in', exact: true }).first().waitFor();
    await screenshot(page, 'audit-admin');
    await page.getByRole('link', { name: 'Mail outbox' }).click();
    await page.getByRole('heading', { name: 'Mail outbox' }).waitFor();
    await screenshot(page, 'mail-outbox-admin');
    await context.close();
  });

  it('lets the admin invite someone who sets a password from the e-mailed link and signs in', async () => {
    const invitee = `invitee-${Date.now()}@slackwater.example`;
    const { context: adminContext } = await newLocalContext(browser);
    const admin = await adminContext.newPage();
    await signIn(admin, 'admin', '/users');
    await admin.getByRole('heading', { name: 'Invite a user' }).waitFor();
    const form = admin.getByRole('form', { name: 'Invite a user' });
    await form.getByLabel('E-mail address').fill(invitee);
    await form.getByLabel('Name').fill('Ines Example');
    await form.getByLabel('Role').selectOption('planner');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await admin.getByText(`Invitation sent to ${invitee}`).waitFor();
    await admin.getByRole('cell', { name: invitee, exact: true }).waitFor();

    await admin.getByRole('link', { name: 'Mail outbox' }).click();
    await admin.getByRole('button', { name: new RegExp(`Your invitation to Slackwater.*${invitee}`) }).click();
    const link = admin.getByRole('link', { name: /\/set-password#token=/ });
    const href = await link.getAttribute('href');
    await screenshot(admin, 'mail-outbox-invitation');
    await admin.getByRole('button', { name: /Account menu/ }).click();
    await screenshot(admin, 'account-menu');
    await adminContext.close();

    const { context, offsite } = await newLocalContext(browser);
    const page = await context.newPage();
    await page.goto(href ?? '');
    await page.getByRole('heading', { name: 'Welcome to Slackwater' }).waitFor();
    expect(page.url()).not.toContain('token'); // the token left the address bar
    await page.getByLabel('New password', { exact: true }).fill('short');
    await page.getByRole('button', { name: 'Set my password' }).click();
    await page.getByText('Use at least 12 characters.').waitFor();
    await page.getByLabel('New password', { exact: true }).fill('harbour crane at dawn');
    await page.getByLabel('New password again').fill('harbour crane at dawn');
    await screenshot(page, 'set-password');
    await page.getByRole('button', { name: 'Set my password' }).click();
    await page.getByText('Your password is set. Sign in with it now.').waitFor();
    await page.getByLabel('E-mail address').fill(invitee);
    await page.getByLabel('Password').fill('harbour crane at dawn');
    await page.getByRole('button', { name: 'Sign in' }).click();
    expect(await navLabels(page)).toEqual(everyone);
    expect(offsite).toEqual([]);

    // The link works once.
    await page.goto(href ?? '');
    await page.getByRole('heading', { name: 'This link does not work' }).waitFor();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/already used/);
    await context.close();
  });

  it('shows a viewer who types an admin address the page is not for them', async () => {
    const { context } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'viewer', '/audit');
    await page.getByRole('heading', { name: 'Not available for your role' }).waitFor();
    await context.close();
  });
});
