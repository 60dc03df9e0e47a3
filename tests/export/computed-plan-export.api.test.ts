/**
 * A plan computed by the real job (engine, worker, stored results) is signed
 * off and exported, on the autumn DST day in Berlin at 15-minute resolution:
 * 25 local hours, 100 intervals, the 02:00-03:00 hour twice. The export must
 * carry the engine's schedule unchanged and upload back as a price profile.
 */
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Plan } from '@shared/schemas/plan';
import { signInAs, type SignedInAgent } from '../support/auth';
import { computePlan, createPlace, dailyPrices, useJobsTestFile } from '../support/jobs';

const jobs = useJobsTestFile('export_computed');
let approver: SignedInAgent;
let viewer: SignedInAgent;

// [S: Directive 2000/84/EC, Art. 3] summer time ends at 01:00 UTC on the last Sunday of October:
// 2026-10-25, local midnight is 2026-10-24T22:00Z (+02:00) and the next one 2026-10-25T23:00Z (+01:00).
const profileStart = Date.parse('2026-10-24T22:00:00Z');
const prices = dailyPrices(3, 15).map((p, i) => (i % 13 === 5 ? -p / 4 : p));
let plan: Plan;
let exported: string;

beforeAll(async () => {
  [approver, viewer] = await Promise.all([signInAs(jobs.app, 'approver'), signInAs(jobs.app, 'viewer')]);
  const place = await createPlace(jobs.planner, {
    prices: { values: prices, startMs: profileStart, stepMinutes: 15 },
    site: { timezone: 'Europe/Berlin' },
  });
  plan = await computePlan(jobs.planner, {
    batteryId: place.batteryId,
    priceProfileId: place.priceProfileId,
    deliveryStart: '2026-10-25T00:00:00+02:00',
    deliveryEnd: '2026-10-26T00:00:00+01:00',
    horizonHours: 36,
    terminalRule: 'cyclic',
    initialSocPct: 50,
  });
  expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
  expect((await jobs.planner.post(`/api/plans/${plan.id}/submit`).send({ version: plan.version })).status).toBe(200);
  const approved = await approver.post(`/api/plans/${plan.id}/approve`).send({ version: plan.version + 1 });
  expect(approved.status, JSON.stringify(approved.body)).toBe(200);
  const response = await viewer
    .get(`/api/plans/${plan.id}/export.csv`)
    .buffer(true)
    .parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => done(null, text));
    });
  expect(response.status).toBe(200);
  expect(response.headers['x-slackwater-checksum']).toBe(`sha256=${approved.body.checksum}`);
  exported = response.body as string;
});

const rows = () => Papa.parse<Record<string, string>>(exported, { header: true, newline: '\r\n', skipEmptyLines: true }).data;

describe('the export of a computed, approved plan', () => {
  it('has 100 quarter-hour rows on the 25-hour day, the repeated hour with both offsets', () => {
    const r = rows();
    expect(r).toHaveLength(100);
    expect(r[0]?.interval_start).toBe('2026-10-25T00:00:00+02:00');
    const starts = r.map((x) => x.interval_start);
    expect(starts).toContain('2026-10-25T02:00:00+02:00');
    expect(starts).toContain('2026-10-25T02:00:00+01:00');
    expect(starts.indexOf('2026-10-25T02:00:00+01:00')).toBe(starts.indexOf('2026-10-25T02:00:00+02:00') + 4);
    expect(r[99]?.interval_end).toBe('2026-10-26T00:00:00+01:00');
  });

  it("carries the engine's delivery steps unchanged, net power and SoC % derived from them", async () => {
    const detail = (await jobs.planner.get(`/api/plans/${plan.id}`)).body as Plan;
    const steps = detail.results!.steps.filter((s) => s.delivery);
    expect(steps).toHaveLength(100);
    rows().forEach((row, t) => {
      const step = steps[t]!;
      expect(Date.parse(row.interval_start!)).toBe(Date.parse(step.time));
      // [D] the file writes kW and kWh to 3 decimals, prices and % to 2: each figure lies within half a unit
      // of its last decimal of the engine's (the same value, without the solver's rounding noise).
      const near = (text: string | undefined, exact: number, decimals: number) =>
        expect(Math.abs(Number(text) - exact)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-9);
      near(row.charge_kw, step.chargeKw, 3);
      near(row.discharge_kw, step.dischargeKw, 3);
      near(row.soc_end_kwh, step.socKwh, 3);
      near(row.grid_import_kw, step.gridImportKw, 3);
      near(row.price_eur_per_mwh, step.priceImport, 2);
      // [D] net battery power = discharge − charge (of the written figures); SoC % of the 2000 kWh nameplate.
      expect(Number(row.net_battery_power_kw_discharge_positive)).toBeCloseTo(
        Number(row.discharge_kw) - Number(row.charge_kw),
        9,
      );
      near(row.soc_end_pct, step.socPct, 2);
    });
  });

  it('uploads back unedited as the same 100 prices the profile held for that day', async () => {
    const upload = await jobs.planner
      .post(`/api/sites/${plan.siteId}/profiles`)
      .field('kind', 'price')
      .field('unit', 'currency/MWh')
      .attach('file', Buffer.from(exported, 'utf8'), 'export.csv');
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    const profile = await jobs.planner.get(`/api/profiles/${upload.body.id}`);
    expect(profile.body).toMatchObject({
      stepMinutes: 15,
      valueCount: 100,
      start: '2026-10-24T22:00:00.000Z',
      end: '2026-10-25T23:00:00.000Z',
    });
    // [D] the window starts at the profile's first interval, so its prices are the first 100 uploaded,
    // as the file writes them: to the cent (a quarter of a price may have had more decimals).
    const values = profile.body.values as number[];
    expect(values).toHaveLength(100);
    values.forEach((v, t) => {
      expect(Math.abs(v - prices[t]!)).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(Math.abs(v * 100 - Math.round(v * 100))).toBeLessThan(1e-6);
    });
    // Prices the profile held to the cent come back exactly.
    const cents = prices.slice(0, 100).filter((p) => Math.abs(p * 100 - Math.round(p * 100)) < 1e-9);
    expect(cents.length).toBeGreaterThan(50);
    prices.slice(0, 100).forEach((p, t) => {
      if (cents.includes(p)) expect(values[t]).toBe(p === 0 ? 0 : p);
    });
  });
});
