import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newLocalContext, screenshot } from './support/browser';

describe('home page smoke test', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('renders the product name in Barlow with no request leaving localhost', async () => {
    const { context, offsite } = await newLocalContext(browser);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    const brand = page.getByText('Slackwater', { exact: true }).first();
    await brand.waitFor();
    await page.evaluate(() => document.fonts.ready);
    const family = await brand.evaluate((el) => getComputedStyle(el).fontFamily);
    expect(family).toMatch(/^"?Barlow"?/);
    // The bundled font file was actually used, not a fallback.
    const barlowLoaded = await page.evaluate(() =>
      [...document.fonts].some((f) => f.family.replace(/"/g, '') === 'Barlow' && f.status === 'loaded'),
    );
    expect(barlowLoaded).toBe(true);
    await screenshot(page, 'smoke-home');
    expect(offsite).toEqual([]);
    await context.close();
  });
});
