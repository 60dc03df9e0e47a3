/**
 * Sites, batteries and profiles in the browser: a planner creates a site and a battery
 * (errors and common-practice warnings beside the fields), uploads a price CSV
 * and a load CSV after checking the in-browser preview, sees them charted and
 * paged, and reads a rejected file's problems by line. A viewer sees no upload.
 */
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newLocalContext, screenshot } from './support/browser';

const samples = path.resolve(import.meta.dirname, '..', '..', 'sample-data');
const password = 'slackwater-demo';

async function signIn(page: Page, email: string) {
  await page.goto(`${inject('baseUrl')}/sign-in`);
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).waitFor();
}

async function chooseFile(page: Page, file: string, kind: string, unit: string) {
  // The upload section starts folded once the site has profiles.
  const upload = page.locator('details', { hasText: 'Upload a profile' });
  if ((await upload.getAttribute('open')) === null) await upload.locator('summary').click();
  await page.getByLabel('Kind', { exact: true }).selectOption(kind);
  await page.getByLabel('Unit in the file').selectOption(unit);
  await page.getByLabel('CSV file').setInputFiles(path.join(samples, file));
}

describe('sites, batteries and profile uploads in the browser', () => {
  let browser: Browser;
  const siteName = `Quayside ${randomUUID().slice(0, 6)}`;
  let siteUrl = '';

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lets a planner create a site with a time zone from the list and a battery, with errors and warnings beside the fields', async () => {
    const { context, offsite } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'planner@slackwater.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).click();
    await page.getByRole('button', { name: 'New site' }).click();
    await page.getByLabel('Name').fill(siteName);
    await page.getByLabel('Time zone').selectOption('Europe/Berlin');
    await page.getByLabel('Import limit').fill('3000');
    await page.getByLabel('Export limit').fill('-5');
    await page.getByRole('button', { name: 'Create site' }).click();
    await expect(page.getByText('The export limit cannot be negative.').isVisible()).resolves.toBe(true);
    await page.getByLabel('Export limit').fill('2500');
    await page.getByRole('button', { name: 'Create site' }).click();
    await page.getByRole('heading', { name: siteName }).waitFor();
    siteUrl = page.url();

    await page.getByRole('button', { name: 'Add battery' }).click();
    await page.getByLabel('Name', { exact: true }).fill('Quay battery');
    // The lithium-ion defaults are filled in: 4 000 kWh, 2 h, √0.85 per direction.
    await expect(page.getByLabel('Charging efficiency', { exact: true }).inputValue()).resolves.toBe('0.922');
    await page.getByLabel('Minimum state of charge').fill('0');
    await page.getByLabel('Maximum state of charge').fill('100');
    await page.getByLabel('Charging efficiency', { exact: true }).fill('92');
    await page.getByRole('button', { name: 'Add battery' }).click();
    await page.getByText('enter 0.92, not 92').waitFor();
    await page.getByLabel('Charging efficiency', { exact: true }).fill('0.95');
    await page.getByText('below common practice').waitFor();
    await page.getByText('above common practice').waitFor();
    await screenshot(page, 'battery-form-warnings');
    await page.getByRole('button', { name: 'Add battery' }).click();
    await page.getByRole('link', { name: 'Quay battery' }).waitFor();
    await expect(page.getByText('2 to check').isVisible()).resolves.toBe(true);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('previews a price CSV in the browser, stores it, and shows it charted with its numbers paged', async () => {
    const { context, offsite } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'planner@slackwater.example');
    await page.goto(siteUrl);
    await chooseFile(page, 'prices-week-2026-05-04-15min.csv', 'price', 'currency/MWh');
    const preview = page.getByRole('region', { name: 'Preview' });
    await preview.getByText('15 min', { exact: true }).waitFor();
    await expect(preview.getByText('672', { exact: true }).isVisible()).resolves.toBe(true);
    await expect(preview.getByText('comma (,)').isVisible()).resolves.toBe(true);
    await expect(preview.getByText('2026-05-04 00:00 +02:00').isVisible()).resolves.toBe(true);
    await preview.locator('figure svg[aria-label]').waitFor();
    await screenshot(page, 'upload-preview');
    await page.getByRole('button', { name: 'Upload profile' }).click();
    await page.getByText(/Stored “prices-week-2026-05-04-15min”: 672 intervals/).waitFor();

    await chooseFile(page, 'site-load-week-2026-05-04-15min.csv', 'load', 'kW');
    await preview.getByText('15 min', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Upload profile' }).click();
    await page.getByText(/Stored “site-load-week-2026-05-04-15min”/).waitFor();
    await page.getByRole('link', { name: 'site-load-week-2026-05-04-15min' }).waitFor();

    await page.getByRole('link', { name: 'prices-week-2026-05-04-15min' }).first().click();
    await page.getByRole('heading', { name: 'prices-week-2026-05-04-15min' }).waitFor();
    await page.locator('figure svg[aria-label*="EUR/MWh"]').waitFor();
    // 672 quarter-hours at 24 rows per page = 28 pages [D].
    await page.getByText('Page 1 of 28', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Next' }).click();
    await page.getByText('Page 2 of 28', { exact: true }).waitFor();
    await expect(page.getByRole('cell', { name: '2026-05-04 06:00 +02:00' }).isVisible()).resolves.toBe(true);
    await screenshot(page, 'profile-detail');
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('shows the problems of a rejected file by line, in the preview and from the server, and stores nothing', async () => {
    const { context } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'planner@slackwater.example');
    await page.goto(siteUrl);
    await page.getByRole('link', { name: 'prices-week-2026-05-04-15min' }).waitFor();
    const before = await page.getByRole('table', { name: 'Profiles' }).getByRole('row').count();
    expect(before).toBe(3); // the header, the price week and the load week stored above
    await chooseFile(page, 'broken/duplicate-timestamp.csv', 'price', 'currency/MWh');
    await page
      .getByRole('alert', { name: /The preview found a problem/ })
      .getByRole('cell', { name: '4', exact: true })
      .waitFor();
    await page.getByRole('button', { name: 'Upload profile' }).click();
    const refused = page.getByRole('alert', { name: /The server refused the file/ });
    await refused.getByRole('cell', { name: '4', exact: true }).waitFor();
    await expect(refused.textContent()).resolves.toMatch(/same interval as line 3.*Nothing was stored/s);
    await screenshot(page, 'upload-refused');
    await expect(page.getByRole('table', { name: 'Profiles' }).getByRole('row').count()).resolves.toBe(before);
    await context.close();
  });

  it('offers a viewer no upload and no battery form, but the profiles to read', async () => {
    const { context } = await newLocalContext(browser);
    const page = await context.newPage();
    await signIn(page, 'viewer@slackwater.example');
    await page.goto(siteUrl);
    await page.getByRole('link', { name: 'prices-week-2026-05-04-15min' }).waitFor();
    await expect(page.getByText('Upload a profile').count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Add battery' }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Edit site' }).count()).resolves.toBe(0);
    await context.close();
  });
});
