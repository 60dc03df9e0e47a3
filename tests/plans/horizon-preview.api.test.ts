/**
 * The quick horizon preview, POST /api/plans/:id/horizon-preview, against the
 * real test database: it agrees with a full plan made with the same horizon through the
 * job, its schedule is optimal by an independent LP solver, bad horizons and models the
 * exact path cannot take are refused with what to do, viewers may use it, and it writes
 * nothing.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { Plan } from '@shared/schemas/plan';
import { testOrigin } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { PREVIEW_LIMIT, previewLimitStore } from '../../server/horizon-preview/horizon-preview.routes';
import { optimalArbitrageProfit } from '../support/reference-lp';
import { HOUR_MS, iso, sqlRows } from '../support/api-fixtures';
import { computePlan, createPlace, dailyPrices, exactPathBattery, type Place, useJobsTestFile } from '../support/jobs';

const jobs = useJobsTestFile('horizon_preview');

const start = Date.parse('2026-03-02T00:00:00Z');
// Four days of hourly prices (invented daily shape with an uneven ripple); the delivery window is the second day.
const prices = dailyPrices(4).map((p, i) => p + ((i * 37) % 11) - 5);
const deliveryStart = start + 24 * HOUR_MS;
const deliveryEnd = start + 48 * HOUR_MS;
const battery = exactPathBattery();
let place: Place;

async function makePlan(p: Place, horizonHours: number, terminalRule: string): Promise<Plan> {
  const plan = await computePlan(jobs.planner, {
    batteryId: p.batteryId,
    priceProfileId: p.priceProfileId,
    deliveryStart: iso(deliveryStart),
    deliveryEnd: iso(deliveryEnd),
    horizonHours,
    terminalRule,
    initialSocPct: 50,
  });
  expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
  return plan;
}

const preview = (agent: SignedInAgent, planId: string, horizonHours: unknown) =>
  agent.post(`/api/plans/${planId}/horizon-preview`).send({ horizonHours });

async function okPreview(planId: string, horizonHours: number): Promise<HorizonPreview> {
  const response = await preview(jobs.planner, planId, horizonHours);
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return response.body as HorizonPreview;
}

const relClose = (a: number, b: number, rel = 1e-9) => Math.abs(a - b) <= rel * Math.max(1, Math.abs(b));

beforeAll(async () => {
  place = await createPlace(jobs.planner, { prices: { values: prices, startMs: start, stepMinutes: 60 }, battery });
});

describe('a horizon preview', () => {
  it('costs what a full plan made with that horizon through the job costs, for free and steady-value ends', async () => {
    for (const rule of ['free', 'steady-value']) {
      const base = await makePlan(place, 24, rule);
      const own = await okPreview(base.id, 24);
      expect(own.method).toBe('dp');
      expect(own.planCost).toBe(base.results!.summary.cost);
      expect(relClose(own.cost, base.results!.summary.cost), `${own.cost} vs ${base.results!.summary.cost}`).toBe(true);

      const other = await okPreview(base.id, 48);
      // [D] Reference: the same engine's plan job (worker thread, automatic path choice, its own steady cycle)
      // on the same stored inputs with horizon 48 h; the preview must reproduce it to 1e-9 relative.
      const full = await makePlan(place, 48, rule);
      const fullResults = full.results!;
      expect(relClose(other.cost, fullResults.summary.cost), `${rule}: ${other.cost} vs ${fullResults.summary.cost}`).toBe(true);
      expect(relClose(other.costDifference!, fullResults.summary.cost - base.results!.summary.cost, 1e-6)).toBe(true);
      expect(other.steps).toHaveLength(fullResults.steps.length);
      other.steps.forEach((s, t) => {
        expect(s.time).toBe(fullResults.steps[t]!.time);
        expect(s.delivery).toBe(fullResults.steps[t]!.delivery);
        expect(s.socPct).toBeCloseTo(fullResults.steps[t]!.socPct, 6);
      });
      expect(other.decisionHorizonHours).toBe(fullResults.decisionHorizonHours);
      expect(other.turnpike.flags).toEqual(fullResults.turnpike.flags);
      expect(other.turnpike.commitWindowSteps).toBe(fullResults.turnpike.commitWindowSteps);
    }
  });

  it('is an optimal schedule by an independent LP solver, and its delivery cost follows from its own SoC', async () => {
    const plan = await makePlan(place, 24, 'free');
    for (const horizonHours of [24, 36, 60]) {
      const p = await okPreview(plan.id, horizonHours);
      expect(p.steps).toHaveLength(horizonHours);
      expect(p.steps.filter((s) => s.delivery)).toHaveLength(24);
      // [D] Pure arbitrage, no self-discharge, positive prices: the battery never charges and discharges in the
      // same hour, so each SoC change gives the flows: Δe > 0 → c = Δe/η_ch, Δe < 0 → d = −Δe·η_dis (Δt = 1 h),
      // and the money paid is Σ p·(c − d)/1000.
      let e = 1000; // 50 % of 2000 kWh
      let paidWindow = 0;
      let paidDelivery = 0;
      p.steps.forEach((s, t) => {
        const next = (s.socPct / 100) * 2000;
        const flow = next > e ? (next - e) / 0.95 : (next - e) * 0.92;
        const paid = (prices[24 + t]! * flow) / 1000;
        paidWindow += paid;
        if (s.delivery) paidDelivery += paid;
        e = next;
      });
      expect(p.cost).toBeCloseTo(paidDelivery, 6);
      // [S] javascript-lp-solver 1.0.3 (npm), on the LP of docs/model.md written out in tests/support/reference-lp.ts
      // [S: Hashmi et al. 2019, arXiv 1905.00418]: the best profit over the lookahead with a free end.
      const best = optimalArbitrageProfit({
        prices: prices.slice(24, 24 + horizonHours),
        stepHours: 1,
        powerKw: 1000,
        energyKwh: 2000,
        socMinPct: 10,
        socMaxPct: 90,
        etaCharge: 0.95,
        etaDischarge: 0.92,
        initialKwh: 1000,
      });
      expect(-paidWindow).toBeCloseTo(best, 4);
    }
  });

  it('refuses a horizon shorter than the delivery window, past the data or off the profile’s steps, naming horizonHours', async () => {
    const plan = await makePlan(place, 24, 'free');
    const cases: [unknown, RegExp][] = [
      [12, /shorter than the delivery window \(24 h\).*Choose 24 h or more/],
      // [D] Four days of data from 2 March 00:00, delivery from 3 March 00:00: 72 h remain after the start.
      [96, /profiles end at 2026-03-06T00:00:00Z, 72 h after the delivery start.*Choose 72 h or less/],
      [24.5, /not a whole number of 60-minute steps/],
      ['48', /Give the horizon in hours/],
      [0, /longer than 0 hours/],
    ];
    for (const [horizonHours, message] of cases) {
      const response = await preview(jobs.planner, plan.id, horizonHours);
      expect(response.status, JSON.stringify(response.body)).toBe(422);
      expect(response.body.issues[0].path).toBe('horizonHours');
      expect(response.body.issues[0].message).toMatch(message);
    }
    expect((await preview(jobs.planner, '00000000-0000-4000-8000-000000000000', 24)).status).toBe(404);
  });

  it('refuses models only the LP solves, saying why and that a full plan can take the horizon', async () => {
    const capped = await createPlace(jobs.planner, {
      prices: { values: prices, startMs: start, stepMinutes: 60 },
      battery: { ...battery, maxCyclesPerDay: 1 },
    });
    const charged = await createPlace(jobs.planner, {
      prices: { values: prices, startMs: start, stepMinutes: 60 },
      battery,
      site: { demandChargePerKw: 8, importLimitKw: 5000 },
      load: { values: prices.map(() => 400), startMs: start, stepMinutes: 60 },
    });
    for (const [p, reason] of [
      [capped, /daily throughput cap \(1 cycles per day\)/],
      [charged, /demand charge \(8 per kW\)/],
    ] as const) {
      const plan = await computePlan(jobs.planner, {
        batteryId: p.batteryId,
        priceProfileId: p.priceProfileId,
        loadProfileId: p.loadProfileId,
        deliveryStart: iso(deliveryStart),
        deliveryEnd: iso(deliveryEnd),
        horizonHours: 24,
        terminalRule: 'free',
        initialSocPct: 50,
      });
      expect(plan.method).toBe('lp');
      const response = await preview(jobs.planner, plan.id, 48);
      expect(response.status, JSON.stringify(response.body)).toBe(422);
      expect(response.body.previewAvailable).toBe(false);
      expect(response.body.error).toMatch(/needs the exact fast path/);
      expect(response.body.error).toMatch(reason);
      expect(response.body.error).toMatch(/Make a full plan with the horizon you want instead/);
      expect(response.body.issues[0]).toEqual({ path: 'model', message: expect.stringMatching(reason) });
    }
  });

  it('is open to a viewer and answers 401 to an anonymous caller', async () => {
    const plan = await makePlan(place, 24, 'free');
    const viewer = await signInAs(jobs.app, 'viewer');
    const seen = await preview(viewer, plan.id, 30);
    expect(seen.status, JSON.stringify(seen.body)).toBe(200);
    expect((seen.body as HorizonPreview).steps).toHaveLength(30);
    const anonymous = await request(jobs.app)
      .post(`/api/plans/${plan.id}/horizon-preview`)
      .set('Origin', testOrigin)
      .send({ horizonHours: 30 });
    expect(anonymous.status).toBe(401);
  });

  it('writes nothing: no plan, job, audit event or plan event appears, and the plan row stays as it was', async () => {
    const plan = await makePlan(place, 24, 'steady-value');
    // Other test files share the database: count what this jobs.planner and this battery could have caused, and the plan row itself.
    const snapshot = () =>
      sqlRows<{ plans: string; jobs: string; audit: string; events: string; studies: string; row: string }>(
        `select (select count(*) from plans where created_by = $2::text) as plans,
                (select count(*) from job_progress j join plans p on p.id = j.entity_id where p.battery_id = $3::uuid) as jobs,
                (select count(*) from audit_events where actor_id = $2 or entity_id = $1::text) as audit,
                (select count(*) from plan_events where plan_id = $1::uuid) as events,
                (select count(*) from horizon_studies where battery_id = $3::uuid) as studies,
                (select md5(p::text) from plans p where id = $1::uuid) as row`,
        [plan.id, jobs.planner.user.id, place.batteryId],
      );
    const before = await snapshot();
    for (const h of [24, 36, 48, 72]) await okPreview(plan.id, h);
    expect((await preview(jobs.planner, plan.id, 12)).status).toBe(422);
    expect(await snapshot()).toEqual(before);
  });
});

describe('the horizon preview rate limit', () => {
  it('answers 429 with Retry-After once a user has used up the burst, and only for that user', async () => {
    const plan = await makePlan(place, 24, 'free');
    const eager = await signInAs(jobs.app, 'viewer');
    // Use up the allowance in the store the route counts in, so the test never races the window's end.
    for (let i = 0; i < PREVIEW_LIMIT.limit; i++) await previewLimitStore.increment(eager.user.id);
    const refused = await preview(eager, plan.id, 30);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(refused.body.error).toMatch(/Too many previews/);
    expect((await preview(jobs.planner, plan.id, 30)).status).toBe(200);
  });
});
