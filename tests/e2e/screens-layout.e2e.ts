/**
 * Every main page as each role sees it with the demo data, on a phone (390 px, the width of
 * common current phones in CSS pixels) and a desktop (1440 px): a full-page screenshot of each
 * in test-results/screenshots, and checks measured in the page. No page is wider than its
 * viewport (document.documentElement.scrollWidth ≤ innerWidth); chart time labels neither
 * overlap nor get cut off; a table wider than its card says that it scrolls; amber and brick
 * are never an ordinary line's colour; the study page logs no negative SVG sizes.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newLocalContext, screenshot, useBrowser } from './support/browser';
import { measureLayout, openSettled } from './support/layout';
import { apiGet, signInByApi, type DemoRole } from './support/session';

const WIDTHS = [390, 1440] as const;

interface Listed {
  id: string;
  status?: string;
  batteryId?: string;
  deliveryStart?: string;
  deliveryEnd?: string;
}

/** The pages of a role, named for their screenshots. */
async function pagesOf(page: Page, role: DemoRole): Promise<[string, string][]> {
  const sites = await apiGet<Listed[]>(page, '/api/sites');
  const site = sites[0]!.id;
  const plans = await apiGet<Listed[]>(page, '/api/plans');
  if (role === 'admin')
    return [
      ['users', '/users'],
      ['audit', '/audit'],
      ['mail', '/mail'],
    ];
  if (role === 'approver') {
    const submitted = plans.find((p) => p.status === 'submitted') ?? plans[0]!;
    return [
      ['overview', '/'],
      ['sign-off', '/sign-off'],
      ['plan-submitted', `/plans/${submitted.id}`],
    ];
  }
  const batteries = await apiGet<Listed[]>(page, `/api/sites/${site}/batteries`);
  const profiles = await apiGet<Listed[]>(page, `/api/sites/${site}/profiles`);
  const studies = await apiGet<Listed[]>(page, '/api/studies');
  const approved = plans.find((p) => p.status === 'approved') ?? plans[0]!;
  const { batteryId, deliveryStart, deliveryEnd } = plans.find((p) => p.status === 'draft') ?? plans[0]!;
  const compare = new URLSearchParams({ batteryId: batteryId!, deliveryStart: deliveryStart!, deliveryEnd: deliveryEnd! });
  return [
    ['overview', '/'],
    ['sites', '/sites'],
    ['site', `/sites/${site}`],
    ['battery', `/batteries/${batteries[0]!.id}`],
    ['profiles', '/profiles'],
    ['profile', `/profiles/${profiles[0]!.id}`],
    ['plans', '/plans'],
    ['plan-approved', `/plans/${approved.id}`],
    ['compare', `/plans/compare?${compare.toString()}`],
    ['plan-new', '/plans/new'],
    ['studies', '/studies'],
    ['study', `/studies/${studies[0]!.id}`],
    ['study-new', '/studies/new'],
  ];
}

describe('screens at 390 px and 1440 px', () => {
  const browser = useBrowser();

  async function visit(role: DemoRole, extra?: (page: Page, width: number, name: string) => Promise<void>) {
    const { context, offsite } = await newLocalContext(browser());
    await signInByApi(context, role);
    const page = await context.newPage();
    const negativeSizes: string[] = [];
    page.on('console', (m) => {
      if (/negative/i.test(m.text())) negativeSizes.push(`${page.url()}: ${m.text()}`);
    });
    const pages = await pagesOf(page, role);
    const problems: string[] = [];
    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      for (const [name, pathname] of pages) {
        await openSettled(page, pathname);
        const found = await measureLayout(page);
        const at = `${role} ${name} at ${width} px`;
        if (found.scrollWidth > found.innerWidth) problems.push(`${at}: ${found.scrollWidth} px wide`);
        for (const l of found.crowdedLabels) problems.push(`${at}: overlapping time labels ${l}`);
        for (const l of found.clippedLabels) problems.push(`${at}: cut-off label ${l}`);
        for (const s of found.silentScrollers) problems.push(`${at}: ${s} scrolls without a cue`);
        for (const c of found.reservedColourLines) problems.push(`${at}: an amber or brick line in "${c}"`);
        await extra?.(page, width, name);
        await screenshot(page, `layout-${role}-${name}-${width}`);
      }
    }
    expect(problems).toEqual([]);
    expect(negativeSizes).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  }

  it("keeps the planner's pages within the screen, the schedule readable at 1440 px, charts uncrowded", async () => {
    await visit('planner', async (page, width, name) => {
      if (name !== 'plan-approved') return;
      // Six charts over time, each with its labels measured above.
      expect((await measureLayout(page)).labelsMeasured).toBeGreaterThan(20);
      // At 1440 px the schedule fits, or says that it scrolls sideways (the generic check above).
      const schedule = page.getByRole('region', { name: /^Schedule table/ });
      const fits = await schedule.evaluate((el) => el.scrollWidth <= el.clientWidth + 1);
      if (width === 1440) expect(fits || (await page.locator('[data-scroll-cue]').count()) > 0).toBe(true);
      // Its figures are right-aligned, with the same decimals down a column.
      const prices = await schedule.locator('tbody tr td:nth-child(3)').allInnerTexts();
      expect(prices.every((p) => /^-?[\d,]+\.\d{2}$/.test(p))).toBe(true);
      expect(
        await schedule
          .locator('tbody tr td:nth-child(3)')
          .first()
          .evaluate((td) => getComputedStyle(td).textAlign),
      ).toBe('right');
      // The End SoC card speaks of SoC.
      expect(await page.getByRole('term').filter({ hasText: 'End SoC' }).locator('xpath=..').innerText()).toMatch(
        /kWh at the window's end; started at/,
      );
    });
  }, 300_000);

  it("keeps the approver's Review link on a phone's screen, and a skip link first", async () => {
    await visit('approver', async (page, width, name) => {
      if (name !== 'sign-off') return;
      const review = page.getByRole('link', { name: /^Review/ }).first();
      const box = await review.boundingBox();
      expect(box, 'a Review link').not.toBeNull();
      expect(box!.x + box!.width).toBeLessThanOrEqual(width);
      // The first Tab lands on "Skip to content", which moves the focus to the page's content.
      await page.keyboard.press('Tab');
      expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Skip to content');
      await page.keyboard.press('Enter');
      expect(await page.evaluate(() => document.activeElement?.id)).toBe('main');
    });
  }, 180_000);

  it("shows the admin's audit trail with names, one time format, and addresses on one line", async () => {
    await visit('admin', async (page, _width, name) => {
      if (name !== 'audit') return;
      const rows = page.getByRole('region', { name: /^Audit entries/ }).locator('tbody tr');
      const cells = await rows.evaluateAll((trs) =>
        trs.slice(0, 30).map((tr) => {
          const [when, who, , on] = [...(tr as HTMLTableRowElement).cells];
          return { when: when!.innerText, who: who!.innerText, on: on!.innerText };
        }),
      );
      expect(cells.length).toBeGreaterThan(0);
      for (const c of cells) {
        // "2026-12-04 19:12 +01:00", as every time in the app.
        expect(c.when).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} [+-]\d{2}:\d{2}$/);
        expect(c.on).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/);
        if (c.who.includes('@')) expect(c.who).not.toContain('\n');
      }
      expect(cells.some((c) => /^user: \S/.test(c.on) || /^plan: plan for /.test(c.on))).toBe(true);
    });
  }, 180_000);
});
