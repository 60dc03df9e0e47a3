/**
 * Settings → API tokens in the browser: create a token, see it once and copy it, call
 * the API with it from outside the browser, revoke it; and the API reference page,
 * drawn from the server's own OpenAPI document with nothing fetched from elsewhere.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newLocalContext, screenshot } from './support/browser';
import { appUrl, signIn } from './support/session';

describe('API tokens and the API reference', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('creates a token shown once, which works with curl-like requests until it is revoked', async () => {
    const { context, offsite } = await newLocalContext(browser, { viewport: { width: 1440, height: 1000 } });
    await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: inject('baseUrl') });
    const page = await context.newPage();
    await signIn(page, 'planner', '/');
    await page.getByRole('button', { name: /Account menu/ }).click();
    await page.getByRole('link', { name: 'API tokens' }).click();
    await page.getByRole('heading', { name: 'API tokens', level: 1 }).waitFor();
    const name = `journey ${Date.now()}`;
    await page.getByLabel('Token name').fill(name);
    await page.getByRole('button', { name: 'Create token' }).click();
    const secret = (await page.getByLabel('The new token').textContent()) ?? '';
    expect(secret).toMatch(/^swt_[0-9a-f]{32}_[A-Za-z0-9_-]{43}$/);
    await page.getByRole('button', { name: 'Copy token' }).click();
    await page.getByRole('button', { name: 'Copied' }).waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(secret);
    await page.evaluate(() => document.fonts.ready);
    await screenshot(page, 'api-tokens-created');

    // Outside the browser: no cookie, no Origin, only the token.
    const me = await fetch(appUrl('/api/auth/me'), { headers: { Authorization: `Bearer ${secret}` } });
    expect(me.status).toBe(200);
    expect(((await me.json()) as { email: string }).email).toBe('planner@slackwater.example');

    await page.getByRole('button', { name: 'I have stored it' }).click();
    expect(await page.content()).not.toContain(secret);
    const row = page.getByRole('row', { name: new RegExp(name) });
    // The list reloads when the secret is put away, and shows the use just made.
    await row.getByText(/^from /).waitFor();
    await expect(row.getByText(/^from /).textContent()).resolves.toMatch(/127\.0\.0\.1|::1/);
    await page.setViewportSize({ width: 390, height: 900 });
    await screenshot(page, 'api-tokens-narrow');
    await page.setViewportSize({ width: 1440, height: 1000 });
    await row.getByRole('button', { name: `Revoke ${name}` }).click();
    await row.getByRole('button', { name: 'Revoke now' }).click();
    await row.waitFor({ state: 'detached' });
    const after = await fetch(appUrl('/api/auth/me'), { headers: { Authorization: `Bearer ${secret}` } });
    expect(after.status).toBe(401);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('lets an admin make a service user and its token', async () => {
    const { context, offsite } = await newLocalContext(browser, { viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signIn(page, 'admin', '/account/tokens');
    await page.getByRole('heading', { name: 'Service users' }).waitFor();
    const name = `Forecast pipeline ${Date.now()}`;
    await page.getByLabel('Service user name').fill(name);
    await page.getByRole('button', { name: 'Create service user' }).click();
    const card = page.getByRole('article', { name: new RegExp(name) });
    await card.getByLabel('Token name').fill('nightly push');
    await card.getByRole('button', { name: 'Create token' }).click();
    const secret = (await page.getByLabel('The new token').textContent()) ?? '';
    const me = await fetch(appUrl('/api/auth/me'), { headers: { Authorization: `Bearer ${secret}` } });
    expect(((await me.json()) as { name: string; role: string }).role).toBe('planner');
    await page.evaluate(() => document.fonts.ready);
    await screenshot(page, 'api-tokens-service-users');
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('shows the API reference with each operation and the roles that may call it', async () => {
    const { context, offsite } = await newLocalContext(browser, { viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signIn(page, 'viewer', '/api-docs');
    await page.getByRole('heading', { name: 'API reference' }).waitFor();
    await page.getByRole('heading', { name: 'Plans', level: 2 }).waitFor();
    const approve = page.locator('details', { hasText: '/api/plans/{id}/approve' }).first();
    await approve.locator(':scope > summary').click();
    await expect(approve.getByLabel('Roles allowed').textContent()).resolves.toBe('ApproverAdmin');
    await screenshot(page, 'api-reference-operation');
    const total = Number((await page.getByText(/^\d+ operations?$/).textContent())?.split(' ')[0]);
    await page.getByLabel('Find an operation').fill('token');
    const found = Number((await page.getByText(/^\d+ operations?$/).textContent())?.split(' ')[0]);
    expect(found).toBeGreaterThanOrEqual(5); // GET|POST /api/tokens, DELETE /api/tokens/{id}, two service-user routes
    expect(found).toBeLessThan(total);
    await page.evaluate(() => document.fonts.ready);
    await screenshot(page, 'api-reference');
    await page.setViewportSize({ width: 390, height: 900 });
    await screenshot(page, 'api-reference-narrow');
    expect(offsite).toEqual([]);
    await context.close();
  });
});
