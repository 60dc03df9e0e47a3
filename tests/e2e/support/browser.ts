/** Debian's Chromium through playwright-core, with a guard that no request leaves localhost. */
import { afterAll, beforeAll } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const screenshotDir = path.resolve(import.meta.dirname, '..', '..', '..', 'test-results', 'screenshots');

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-dev-shm-usage',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--disable-quic',
      '--no-first-run',
    ],
  });
}

/** One browser for the journeys of a `describe` block: launched before them, closed after. */
export function useBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('The browser is not launched yet: call the getter inside a test.');
    return browser;
  };
}

/** A context that records (and blocks) every request to a host other than localhost. */
export async function newLocalContext(browser: Browser, options: Parameters<Browser['newContext']>[0] = {}) {
  const context: BrowserContext = await browser.newContext({
    viewport: { width: 1360, height: 900 },
    acceptDownloads: true,
    ...options,
  });
  const offsite: string[] = [];
  await context.route('**/*', (route) => {
    const url = new URL(route.request().url());
    const local =
      ['localhost', '127.0.0.1', '[::1]'].includes(url.hostname) || url.protocol === 'data:' || url.protocol === 'blob:';
    if (local) return route.continue();
    offsite.push(url.toString());
    return route.abort();
  });
  return { context, offsite };
}

/**
 * The whole page as a user scrolling through it would see it. Chromium's `fullPage` capture
 * leaves charts that straddle the fold blank (seen on the profile page), so the viewport is
 * grown to the page's height for the shot and restored after.
 */
export async function screenshot(page: Page, name: string) {
  mkdirSync(screenshotDir, { recursive: true });
  const viewport = page.viewportSize();
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  const grow = viewport !== null && height > viewport.height;
  if (grow) await page.setViewportSize({ width: viewport.width, height });
  await page.evaluate(() =>
    document.fonts.ready.then(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done)))),
  );
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`) });
  if (grow) await page.setViewportSize(viewport);
}

/** Runs a journey; when it fails, saves a shot of every page still open (`FAILED-<name>-<n>`) before failing. */
export async function withFailureShots(name: string, pages: () => Page[], journey: () => Promise<void>): Promise<void> {
  try {
    await journey();
  } catch (error) {
    for (const [n, page] of pages().entries()) {
      if (!page.isClosed()) await screenshot(page, `FAILED-${name}-${n + 1}`).catch(() => undefined);
    }
    throw error;
  }
}
