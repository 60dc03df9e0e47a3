/**
 * Journey 2: the planner makes a plan in the form, then from the comparison page
 * plans for the same delivery window with three horizons and both terminal rules (`free`,
 * `steady-value`), reads the comparison, finds the flag on the short-horizon `free` plan,
 * tries another horizon with the plan page's slider (re-planned on the fast path, then the plan
 * form preset with it), runs a horizon study (watching its progress bar) and adopts its
 * recommendation as the site's default horizon, which the plan form then proposes.
 */
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { newLocalContext, screenshot, withFailureShots, useBrowser } from './support/browser';
import { DEMO_BATTERY, DEMO_SITE, demoSources } from './support/plans';
import { apiGet, apiPatchJson, signIn } from './support/session';

const DAY_MS = 86_400_000;
const YEAR_PRICES = 'Day-ahead prices 2026 (hourly)';

/**
 * A summer delivery day from 05:00 to 05:00 local time (+02:00 all summer, no DST change),
 * a different one each minute so repeated runs on one database do not meet earlier plans.
 * [D] The demo prices' steady cycle is full at 05:00 (it charges in the night trough), so a
 * 24 h plan with the `free` rule, which values nothing left at the end, must leave it before
 * the window closes: the leaving arc reaches into the delivery window and the plan is flagged.
 */
function deliveryDay() {
  const start = Date.parse('2026-05-15T05:00:00+02:00') + (Math.floor(Date.now() / 60_000) % 120) * DAY_MS;
  const wall = (ms: number) => new Date(ms + 2 * 3_600_000).toISOString().slice(0, 16); // +02:00 wall time for datetime-local
  return { from: wall(start), to: wall(start + DAY_MS) };
}

/** Chooses the option whose text contains `text` (options arrive with their query). */
async function choose(select: Locator, text: string) {
  const option = select.locator('option', { hasText: text }).first();
  await option.waitFor({ state: 'attached' });
  await select.selectOption((await option.getAttribute('value')) ?? '');
}

async function chooseSources(page: Page, price?: string) {
  await choose(page.getByLabel('Site', { exact: true }), DEMO_SITE);
  await choose(page.getByLabel('Battery', { exact: true }), DEMO_BATTERY);
  if (price) await choose(page.getByLabel('Price profile'), price);
}

interface ComparisonRow {
  horizon: string;
  rule: string;
  method: string;
  leaving: string;
  flags: number;
}

async function comparisonRows(page: Page): Promise<ComparisonRow[]> {
  const table = page.getByRole('table', { name: 'Plans of this delivery window by horizon and terminal rule' });
  const headers = await table.getByRole('columnheader').allInnerTexts();
  const col = (name: string) => headers.indexOf(name);
  const rows = await table
    .locator('tbody tr')
    .evaluateAll((trs) => trs.map((tr) => [...(tr as HTMLTableRowElement).cells].map((td) => td.innerText.trim())));
  return rows.map((cells) => ({
    horizon: cells[col('Horizon')] ?? '',
    rule: cells[col('Terminal rule')] ?? '',
    method: cells[col('Method')] ?? '',
    leaving: cells[col('Leaving arc')] ?? '',
    flags: cells[col('Flags')] === 'none' ? 0 : Number.parseInt(cells[col('Flags')] ?? '', 10), // "2 flags"
  }));
}

describe('comparing plans by horizon', () => {
  const browser = useBrowser();

  it('plans one window with three horizons and two terminal rules, flags the short free plan, and adopts a study’s horizon', async () => {
    const { context, offsite } = await newLocalContext(browser());
    const page = await context.newPage();
    await withFailureShots(
      'compare',
      () => [page],
      async () => {
        await signIn(page, 'planner');
        const { siteId } = await demoSources(page);
        // A default no study offers (its horizons are 6 … 168 h), so adopting the recommendation always changes it.
        await apiPatchJson(page, `/api/sites/${siteId}`, { defaultHorizonHours: 47 });

        // The first plan through the form: 24 h, free.
        const day = deliveryDay();
        await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Plans' }).click();
        await page.getByRole('link', { name: 'New plan' }).click();
        await page.getByRole('heading', { name: 'New plan' }).waitFor();
        await chooseSources(page, YEAR_PRICES);
        await page.getByLabel('From').fill(day.from);
        await page.getByLabel('To', { exact: true }).fill(day.to);
        await page.getByLabel('Horizon', { exact: true }).fill('24');
        await page.getByLabel('Terminal rule').selectOption('free');
        await page.getByLabel('Initial SoC').fill('50');
        await screenshot(page, 'compare-1-plan-form');
        await page.getByLabel('Initial SoC').press('Enter');
        await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
        await page.getByRole('heading', { name: 'Schedule' }).waitFor({ timeout: 90_000 });

        // The comparison page proposes 24, 36 and 48 h with free and steady-value: the five missing plans are queued.
        await page.getByRole('link', { name: 'Compare horizons for this delivery window' }).click();
        await page.getByRole('heading', { name: 'Compare horizons' }).waitFor();
        const horizons = page.getByRole('group', { name: 'Horizons (h)' });
        for (const h of ['24', '36', '48'])
          expect(await horizons.getByRole('checkbox', { name: h, exact: true }).isChecked()).toBe(true);
        const rules = page.getByRole('group', { name: 'Terminal rules' });
        for (const r of ['free', 'steady-value'])
          expect(await rules.getByRole('checkbox', { name: r, exact: true }).isChecked()).toBe(true);
        await page.getByRole('button', { name: 'Add these plans' }).click();
        await page.getByRole('status').filter({ hasText: '5 plans queued.' }).waitFor({ timeout: 60_000 });

        // All six computed (method shown instead of the job state), then read.
        const combos = ['24 h/free', '24 h/steady-value', '36 h/free', '36 h/steady-value', '48 h/free', '48 h/steady-value'];
        let rows: ComparisonRow[] = [];
        await expect
          .poll(
            async () => {
              rows = await comparisonRows(page);
              return combos.every((c) => rows.some((r) => `${r.horizon}/${r.rule}` === c && /^(dp|lp)$/.test(r.method)));
            },
            { timeout: 120_000, interval: 1000, message: 'all six plans computed' },
          )
          .toBe(true);
        expect(await page.getByRole('progressbar').count()).toBe(0);
        await page
          .getByRole('figure', { name: /SoC over the delivery window/ })
          .locator('svg path')
          .first()
          .waitFor({ timeout: 30_000 });
        await screenshot(page, 'compare-2-comparison');

        // The short free plan carries more flags than any other; its leaving arc reaches into the window.
        const short = rows.find((r) => r.horizon === '24 h' && r.rule === 'free');
        const others = rows.filter((r) => r !== short && combos.includes(`${r.horizon}/${r.rule}`));
        expect(short?.flags).toBeGreaterThan(Math.max(...others.map((r) => r.flags)));
        expect(short?.leaving).not.toMatch(/^(–|0 min|0 h)$/);
        const shortRow = page
          .getByRole('row')
          .filter({ has: page.getByRole('cell', { name: 'free', exact: true }) })
          .filter({ has: page.getByRole('link', { name: '24 h', exact: true }) });
        await shortRow.getByRole('link', { name: '24 h', exact: true }).first().click();
        const flags = page.getByRole('list', { name: 'Flags' });
        await flags.getByText(/The leaving arc reaches into the delivery window/).waitFor({ timeout: 60_000 });
        expect(await flags.innerText()).toMatch(/use the steady-value terminal rule/);
        await screenshot(page, 'compare-3-short-plan-flag');

        // Try another horizon on the same page: one step right with the keyboard re-plans on the fast path at once,
        // and the plan form opens preset with that horizon.
        const tryHorizon = page.getByRole('region', { name: 'Try another horizon' });
        const slider = tryHorizon.getByRole('slider', { name: 'Horizon' });
        await tryHorizon
          .getByRole('status')
          .filter({ hasText: /Re-planned with 24 h in/ })
          .waitFor({ timeout: 30_000 });
        await slider.focus();
        await page.keyboard.press('ArrowRight');
        expect(await slider.inputValue()).toBe('25');
        await tryHorizon
          .getByRole('status')
          .filter({ hasText: /Re-planned with 25 h in/ })
          .waitFor({ timeout: 30_000 });
        expect(await tryHorizon.getByLabel('Horizon in hours').inputValue()).toBe('25');
        await tryHorizon
          .getByRole('figure', { name: 'SoC of the plan and of the preview' })
          .locator('svg path')
          .first()
          .waitFor({ timeout: 30_000 });
        await screenshot(page, 'compare-3b-horizon-preview');
        await tryHorizon.getByRole('link', { name: 'Make a plan with 25 h' }).click();
        await page.getByRole('heading', { name: 'New plan' }).waitFor();
        await expect.poll(() => page.getByLabel('From').inputValue(), { timeout: 30_000 }).toBe(day.from);
        expect(await page.getByLabel('Horizon', { exact: true }).inputValue()).toBe('25');
        expect(await page.getByLabel('Terminal rule').inputValue()).toBe('free');

        // A horizon study over the whole price year (empty period), watched while it runs.
        await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Studies' }).click();
        await page.getByRole('link', { name: 'New study' }).click();
        await chooseSources(page, YEAR_PRICES);
        expect(await page.getByLabel('Horizons').inputValue()).toMatch(/^6, 12, 24/);
        await page.getByLabel('Initial SoC').fill('50');
        await page.getByLabel('Initial SoC').press('Enter');
        await page.waitForURL(/\/studies\/[0-9a-f-]{36}$/);
        const progress = page.getByRole('progressbar', { name: 'Running the study' });
        await progress.waitFor({ timeout: 30_000 });
        const seen = Number(await progress.getAttribute('aria-valuenow'));
        expect(seen).toBeGreaterThanOrEqual(0);
        expect(seen).toBeLessThan(100);
        await screenshot(page, 'compare-4-study-running');
        const recommendation = page.getByRole('heading', {
          name: /^Recommended: \d+ h with the (free|steady-value|cyclic) terminal rule$/,
        });
        await recommendation.waitFor({ timeout: 120_000 });
        expect(await progress.count()).toBe(0);
        const hours = Number(/(\d+) h/.exec(await recommendation.innerText())?.[1]);
        await page
          .getByRole('figure', { name: 'Gap to the reference path against horizon' })
          .locator('svg path')
          .filter({ visible: true })
          .first()
          .waitFor({ timeout: 30_000 });
        await screenshot(page, 'compare-5-study-done');

        // Adopt it: the site's default changes and the plan form proposes it.
        await page.getByRole('button', { name: `Make ${hours} h the default for new plans at ${DEMO_SITE}` }).click();
        await page
          .getByRole('status')
          .filter({ hasText: `Saved: new plans at this site start with ${hours} h.` })
          .waitFor();
        expect((await apiGet<{ defaultHorizonHours: number }>(page, `/api/sites/${siteId}`)).defaultHorizonHours).toBe(hours);
        await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Plans' }).click();
        await page.getByRole('link', { name: 'New plan' }).click();
        await chooseSources(page);
        await page.getByText(`Empty: the site's default, ${hours} h.`).waitFor();
        await screenshot(page, 'compare-6-default-adopted');

        expect(offsite).toEqual([]);
      },
    );
    await context.close();
  });
});
