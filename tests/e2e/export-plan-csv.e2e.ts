/**
 * Journey 4: the planner exports an approved plan as CSV from its page. The
 * download is saved, parsed with an independent RFC 4180 reader (papaparse), and checked
 * against the schedule table the page shows (every delivery interval, values within the
 * page's rounding) and against the checksum the page shows.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newLocalContext, screenshot, screenshotDir, withFailureShots, useBrowser } from './support/browser';
import { createPlan, demoSources, submitAndApprove, waitForPlan } from './support/plans';
import { apiGet, appUrl, signIn, signInByApi } from './support/session';

/** The delivery day of this journey (others use other days of the demo price week). */
const day = { deliveryStart: '2026-05-07T00:00:00+02:00', deliveryEnd: '2026-05-08T00:00:00+02:00' };

/** "2,000.5" or "−3" as the page writes numbers (en-US grouping) back to a number; "–" is no value. */
const pageNumber = (text: string) => (text.trim() === '–' ? null : Number(text.replace(/,/g, '').replace('−', '-')));

/** Every row of the schedule table, page by page, keyed by column header. */
async function readScheduleTable(page: Page): Promise<Record<string, string>[]> {
  const table = page.getByRole('table', { name: /^Schedule/ });
  const headers = await table.getByRole('columnheader').allInnerTexts();
  const pager = page.getByRole('navigation', { name: 'Pages of the schedule' });
  const rows: Record<string, string>[] = [];
  for (let pageNo = 1; ; pageNo += 1) {
    await pager.getByText(new RegExp(`^Page ${pageNo} of \\d+$`)).waitFor();
    const cells = await table
      .locator('tbody tr')
      .evaluateAll((trs) => trs.map((tr) => [...(tr as HTMLTableRowElement).cells].map((td) => td.innerText)));
    for (const row of cells) rows.push(Object.fromEntries(headers.map((h, k) => [h, row[k] ?? ''])));
    const next = pager.getByRole('button', { name: 'Next' });
    if (await next.isDisabled()) return rows;
    await next.click();
  }
}

interface PlanInputs {
  initialSocPct: number;
  results: { stepMinutes: number };
  inputs: {
    battery: { energyKwh: number; efficiencyCharge: number; efficiencyDischarge: number; selfDischargePctPerHour: number };
  };
}

describe('exporting a plan to CSV', () => {
  const browser = useBrowser();

  it('downloads a file that matches the schedule on the page interval by interval and carries its checksum', async () => {
    const planner = await newLocalContext(browser());
    const approver = await newLocalContext(browser());
    const page = await planner.context.newPage();
    const approverPage = await approver.context.newPage();
    await withFailureShots(
      'export',
      () => [page],
      async () => {
        // An approved plan: computed, submitted by the planner, approved by the approver.
        await signIn(page, 'planner');
        await signInByApi(approver.context, 'approver');
        const planId = await createPlan(page, await demoSources(page), {
          ...day,
          horizonHours: 36,
          terminalRule: 'steady-value',
          initialSocPct: 40,
        });
        await waitForPlan(page, planId);
        await submitAndApprove(page, approverPage, planId);

        await page.goto(appUrl(`/plans/${planId}`));
        const signOff = page.getByRole('region', { name: 'Sign-off' });
        await signOff.getByText('Approved', { exact: true }).waitFor({ timeout: 60_000 });
        const pageChecksum = await signOff.getByText(/^[0-9a-f]{64}$/).innerText();
        const shown = (await readScheduleTable(page)).filter((r) => r.Part === 'delivery');
        expect(shown).toHaveLength(96); // [D] 24 h of 15-minute intervals, no DST change on 2026-05-07
        await screenshot(page, 'export-1-approved-plan');

        // The link downloads the file; saved where the screenshots go.
        const link = signOff.getByRole('link', { name: 'Export the schedule as CSV' });
        await link.focus();
        const [download] = await Promise.all([page.waitForEvent('download'), page.keyboard.press('Enter')]);
        expect(download.suggestedFilename()).toMatch(/\.csv$/);
        const saved = path.join(screenshotDir, '..', 'downloads', download.suggestedFilename());
        await download.saveAs(saved);
        const text = readFileSync(saved, 'utf8');
        expect(text.split('\r\n').length).toBeGreaterThan(96); // RFC 4180 section 2.1: CRLF record ends

        const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
        expect(parsed.errors).toEqual([]);
        const rows = parsed.data;
        expect(rows).toHaveLength(shown.length);

        // Interval by interval against the table: the same instants, values within the page's rounding.
        const num = (row: Record<string, string>, column: string) => Number(row[column]);
        rows.forEach((row, t) => {
          const start = row.interval_start ?? '';
          const onPage = shown[t] ?? {};
          // "2026-05-07T00:00:00+02:00" is shown as "2026-05-07 00:00 +02:00".
          expect(`${start.slice(0, 10)} ${start.slice(11, 16)} ${start.slice(19)}`).toBe(onPage['Start (Europe/Berlin)']);
          expect(Date.parse(row.interval_end ?? '') - Date.parse(start)).toBe(15 * 60_000);
          const near = (column: string, header: string, halfUnit: number) => {
            expect(
              Math.abs(num(row, column) - (pageNumber(onPage[header] ?? '') ?? Number.NaN)),
              `${column} at ${start}`,
            ).toBeLessThanOrEqual(halfUnit + 1e-9);
          };
          near('price_eur_per_mwh', 'Price EUR/MWh', 0.005);
          near('charge_kw', 'Charge kW', 0.05);
          near('discharge_kw', 'Discharge kW', 0.05);
          near('soc_end_kwh', 'SoC kWh (end)', 0.05);
          near('soc_end_pct', 'SoC %', 0.05);
          near('grid_import_kw', 'Import kW', 0.05);
          near('grid_export_kw', 'Export kW', 0.05);
          // [D] the net column is discharge minus charge (its header says discharge positive).
          expect(num(row, 'net_battery_power_kw_discharge_positive')).toBeCloseTo(
            num(row, 'discharge_kw') - num(row, 'charge_kw'),
            9,
          );
          expect(row.plan_id).toBe(planId);
          expect(row.plan_status).toBe('approved');
        });

        // [D] docs/model.md: e_t = (1 − σΔt)·e_{t−1} + η_ch·c_t·Δt − d_t·Δt/η_dis from e_0 = initial SoC, so the
        // exported SoC follows from the exported flows and the battery parameters the plan was made with.
        const plan = await apiGet<PlanInputs>(page, `/api/plans/${planId}`);
        const { energyKwh, efficiencyCharge, efficiencyDischarge, selfDischargePctPerHour } = plan.inputs.battery;
        const dt = plan.results.stepMinutes / 60;
        // The file writes kW and kWh to 3 decimals and % to 2: each written flow is within 0.0005 kW of the engine's,
        // so the SoC followed from them may drift by 0.0005·Δt·(η_ch + 1/η_dis) kWh a step, plus the SoC's own rounding.
        let energy = (plan.initialSocPct / 100) * energyKwh;
        const drift = 0.0005 * dt * (efficiencyCharge + 1 / efficiencyDischarge);
        rows.forEach((row, t) => {
          energy =
            (1 - (selfDischargePctPerHour / 100) * dt) * energy +
            efficiencyCharge * num(row, 'charge_kw') * dt -
            (num(row, 'discharge_kw') * dt) / efficiencyDischarge;
          expect(Math.abs(num(row, 'soc_end_kwh') - energy), `SoC at ${row.interval_start}`).toBeLessThan(
            1e-6 * energyKwh + 0.0005 + (t + 1) * drift,
          );
          expect(Math.abs(num(row, 'soc_end_pct') - (num(row, 'soc_end_kwh') / energyKwh) * 100)).toBeLessThanOrEqual(
            0.005 + (0.0005 / energyKwh) * 100 + 1e-9,
          );
        });

        // The facts on the first row: the page's checksum, the approver, the cautions.
        const first = rows[0] ?? {};
        expect(first.checksum_sha256).toBe(pageChecksum);
        const signedOffBy = signOff
          .getByRole('term')
          .filter({ hasText: 'Signed off by' })
          .locator('xpath=following-sibling::dd[1]');
        expect(await signedOffBy.innerText()).toMatch(new RegExp(`^${first.approved_by} on `));
        expect(first.notice).toMatch(/qualified personnel decide dispatch/);
        expect(first.site).toBe('Harbourside Depot');
        await screenshot(page, 'export-2-after-download');

        expect(planner.offsite).toEqual([]);
        expect(approver.offsite).toEqual([]);
      },
    );
    await Promise.all([planner.context.close(), approver.context.close()]);
  });
});
