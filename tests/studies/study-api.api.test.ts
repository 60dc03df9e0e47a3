/**
 * Horizon studies through the API and a background job: results against an
 * independent LP solver, progress to the end, lists with status filters, and
 * bad inputs refused with nothing stored.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Study, StudyCreated } from '@shared/schemas/study';
import { optimalArbitrageProfit } from '../support/reference-lp';
import { HOUR_MS, iso, sqlRows } from '../support/api-fixtures';
import { createPlace, dailyPrices, exactPathBattery, type Place, useJobsTestFile, waitUntilFinished } from '../support/jobs';

const jobs = useJobsTestFile('study_api');
let place: Place;
const start = Date.parse('2026-03-02T00:00:00Z');
const prices = dailyPrices(4).map((p, i) => p + ((i * 29) % 13) - 6);
const battery = exactPathBattery({ efficiencyCharge: 0.93, efficiencyDischarge: 0.93 });

beforeAll(async () => {
  place = await createPlace(jobs.planner, { prices: { values: prices, startMs: start, stepMinutes: 60 }, battery });
});

const body = (over: Record<string, unknown> = {}) => ({
  batteryId: place.batteryId,
  priceProfileId: place.priceProfileId,
  start: iso(start + 24 * HOUR_MS),
  end: iso(start + 72 * HOUR_MS),
  horizonsHours: [6, 12, 24],
  replanHours: 1,
  terminalRules: ['free', 'steady-value'],
  ...over,
});

const storedStudies = async () =>
  (await sqlRows<{ n: number }>('select count(*)::int as n from horizon_studies where battery_id = $1', [place.batteryId]))[0]!.n;

describe('a horizon study computed by a background job', () => {
  let study: Study;

  beforeAll(async () => {
    const created = await jobs.planner.post('/api/studies').send(body());
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const { study: queued, job } = created.body as StudyCreated;
    expect(job.state).toBe('queued');
    expect(queued.status).toBe('queued');
    study = await waitUntilFinished<Study>(jobs.planner, `/api/studies/${queued.id}`);
  });

  it('finishes with every run and progress at 100 %', () => {
    expect(study.status, study.errorMessage ?? '').toBe('completed');
    expect(study.job?.shareDone).toBe(1);
    const runs = study.results!.runs;
    expect(runs.map((r) => `${r.horizonHours}/${r.terminal}`).sort()).toEqual([
      '12/free',
      '12/steady-value',
      '24/free',
      '24/steady-value',
      '6/free',
      '6/steady-value',
    ]);
    expect(runs.every((r) => r.status === 'optimal' && r.solves === 48)).toBe(true);
  });

  it('compares with a reference path equal to an independent LP optimum, and no run beats it', () => {
    // [D] The reference path is the optimal plan over the whole period from the same SoC with a free
    // end; javascript-lp-solver solves that LP independently. A closed-loop run applies a feasible
    // schedule of the same LP, so its cost can never be below the reference: every gap is ≥ 0.
    const best = optimalArbitrageProfit({
      prices: prices.slice(24, 72),
      stepHours: 1,
      powerKw: 1000,
      energyKwh: 2000,
      socMinPct: 10,
      socMaxPct: 90,
      etaCharge: 0.93,
      etaDischarge: 0.93,
      initialKwh: 1000,
    });
    expect(study.results!.referenceCost).toBeCloseTo(-best, 4);
    for (const run of study.results!.runs) expect(run.gapPct!).toBeGreaterThanOrEqual(-1e-6);
  });

  it('gives every run its net figures, and gaps in currency against the reference net cost', () => {
    const r = study.results!;
    expect(typeof r.referenceNetCost).toBe('number');
    expect(r.storedEnergyValuation!.description.length).toBeGreaterThan(20);
    // [D] the reference path's battery value is the site without a battery minus its net cost.
    expect(r.referenceBatteryValue!).toBeCloseTo(r.noBatteryCost! - r.referenceNetCost!, 6);
    for (const run of r.runs) {
      // [D] definitions: netCost = cost − storedEnergyChange, batteryValue = noBatteryCost − netCost,
      // gapValue = netCost − referenceNetCost, valueGapPct = 100·gapValue / |reference battery value|.
      expect(run.netCost!).toBeCloseTo(run.cost! - run.storedEnergyChange!, 6);
      expect(run.batteryValue!).toBeCloseTo(run.noBatteryCost! - run.netCost!, 6);
      expect(run.gapValue!).toBeCloseTo(run.netCost! - r.referenceNetCost!, 6);
      expect(run.valueGapPct!).toBeCloseTo((100 * run.gapValue!) / Math.abs(r.referenceBatteryValue!), 6);
      // [D] pure arbitrage: no battery, no cost.
      expect(run.noBatteryCost!).toBeCloseTo(0, 9);
    }
  });

  it('recommends one of the studied horizons with its reason', () => {
    const rec = study.results!.recommendation!;
    expect([6, 12, 24]).toContain(rec.horizonHours);
    expect(rec.reason.length).toBeGreaterThan(20);
    expect(['dp', 'lp', 'mixed']).toContain(study.method);
  });

  it('is listed for its site, with status filters and the recommendation but no runs', async () => {
    const list = await jobs.planner.get(`/api/studies?siteId=${place.siteId}`);
    expect(list.status).toBe(200);
    const item = (list.body as Study[]).find((s) => s.id === study.id)!;
    expect(item.recommendation?.horizonHours).toBe(study.results!.recommendation!.horizonHours);
    expect(item.results).toBeUndefined();
    const failed = await jobs.planner.get(`/api/studies?siteId=${place.siteId}&status=failed`);
    expect((failed.body as Study[]).some((s) => s.id === study.id)).toBe(false);
    expect((await jobs.planner.get('/api/studies?status=lost')).status).toBe(422);
  });

  it('records one study.created and one study.computed audit event', async () => {
    const events = await sqlRows<{ action: string }>('select action from audit_events where entity_id = $1 order by id', [
      study.id,
    ]);
    expect(events.map((e) => e.action)).toEqual(['study.created', 'study.computed']);
  });
});

describe('POST /api/studies with bad input', () => {
  async function expectRefused(over: Record<string, unknown>, path: string, message: RegExp) {
    const before = await storedStudies();
    const response = await jobs.planner.post('/api/studies').send(body(over));
    expect(response.status, JSON.stringify(response.body)).toBe(422);
    const issue = (response.body.issues as { path: string; message: string }[]).find((i) => i.path === path);
    expect(issue, JSON.stringify(response.body.issues)).toBeDefined();
    expect(issue!.message).toMatch(message);
    expect(await storedStudies()).toBe(before);
  }

  it('refuses a horizon shorter than the re-plan interval, naming the horizon and the fix', async () => {
    await expectRefused(
      { horizonsHours: [2, 12], replanHours: 4 },
      'horizonsHours.0',
      /2 h is shorter than the re-plan interval of 4 h.*Lengthen the horizon or re-plan more often/,
    );
  });

  it('refuses a period outside the price profile', async () => {
    await expectRefused({ end: iso(start + 200 * HOUR_MS) }, 'end', /outside the period of the price profile/);
  });

  it('refuses a profile from another site', async () => {
    const other = await createPlace(jobs.planner, { prices: { values: prices, startMs: start, stepMinutes: 60 } });
    await expectRefused({ priceProfileId: other.priceProfileId }, 'priceProfileId', /belongs to another site/);
  });

  it('refuses a re-plan interval that is not a whole number of profile steps', async () => {
    await expectRefused({ replanHours: 1.5, horizonsHours: [6] }, 'replanHours', /not a whole number of 60-minute steps/);
  });
});
