/**
 * The net figures of a plan in the API (money rule of docs/model.md): stored
 * energy valued at the steady cycle's value, net cost beside cash cost, and the
 * same figures on the horizon preview, whose difference from the plan is in net
 * cost. Also: the turnpike figures carry excursions and the sentence agrees.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import type { JobWorker } from '../../server/jobs/job-worker';
import { createPlace, dailyPrices, startTestWorker, stopTestWorker, useOwnJobQueues, waitUntilFinished } from '../support/jobs';
import { HOUR_MS } from '../support/api-fixtures';

useOwnJobQueues('plan_net_figures');
const app = createTestApp();
let planner: SignedInAgent;
let worker: JobWorker | null = null;
let plan: Plan;

const start = Date.parse('2026-03-02T00:00:00Z');
const iso = (ms: number) => new Date(ms).toISOString();

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  worker = await startTestWorker();
  const prices = dailyPrices(4).map((p, i) => p + ((i * 37) % 11) - 5);
  const place = await createPlace(planner, {
    prices: { values: prices, startMs: start, stepMinutes: 60 },
    battery: {
      energyKwh: 2000,
      powerChargeKw: 1000,
      powerDischargeKw: 1000,
      efficiencyCharge: 0.95,
      efficiencyDischarge: 0.92,
      socMinPct: 10,
      socMaxPct: 90,
      socInitialPct: 50,
      selfDischargePctPerHour: 0,
      degradationCostPerMwh: 0,
      maxCyclesPerDay: null,
    },
  });
  const created = await planner.post('/api/plans').send({
    batteryId: place.batteryId,
    priceProfileId: place.priceProfileId,
    deliveryStart: iso(start + 24 * HOUR_MS),
    deliveryEnd: iso(start + 48 * HOUR_MS),
    horizonHours: 36,
    terminalRule: 'steady-value',
    initialSocPct: 50,
  });
  expect(created.status, JSON.stringify(created.body)).toBe(202);
  plan = await waitUntilFinished<Plan>(planner, `/api/plans/${(created.body as PlanCreated).plan.id}`);
  expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
});
afterAll(async () => stopTestWorker(worker));

describe('the net figures of a plan', () => {
  it('values stored energy at the steady cycle and ranks by cost minus its change', () => {
    const s = plan.results!.summary;
    const v = s.storedEnergyValuation!;
    expect(v.valued).toBe(true);
    expect(v.description).toMatch(
      /^Energy (left )?in the battery valued at the steady cycle's \d+\.\d{2} EUR\/MWh for \d\d:\d\d/,
    );
    // [D] change = (λ̄(end)·e_end − λ̄(start)·e_start)/1000 from the figures the valuation reports (kWh → MWh).
    const steps = plan.results!.steps;
    const deliveryEnd = steps.filter((x) => x.delivery).at(-1)!;
    expect(v.startEnergyKwh).toBeCloseTo(1000, 6); // [D] 50 % of 2000 kWh
    expect(v.endEnergyKwh).toBeCloseTo(deliveryEnd.socKwh, 6);
    expect(s.storedEnergyChange!).toBeCloseTo(
      (v.endValuePerMwh! * v.endEnergyKwh - v.startValuePerMwh! * v.startEnergyKwh) / 1000,
      6,
    );
    // [D] definitions: netCost = cost − storedEnergyChange, batteryValue = noBatteryCost − netCost.
    expect(s.netCost!).toBeCloseTo(s.cost - s.storedEnergyChange!, 9);
    expect(s.batteryValue!).toBeCloseTo(s.noBatteryCost! - s.netCost!, 9);
    // [D] pure arbitrage (no load, no generation): the site without a battery pays nothing.
    expect(s.noBatteryCost!).toBeCloseTo(0, 9);
    expect(s.earnings).toBeCloseTo(s.noBatteryCost! - s.cost, 9);
  });

  it('counts excursions, and the sentence agrees with them', () => {
    const tp = plan.results!.turnpike;
    const ex = tp.excursions!;
    expect(Number.isInteger(ex.count) && Number.isInteger(ex.steps)).toBe(true);
    // [D] every excursion step lies outside the entry and leaving arcs, so they never add up past the steps.
    expect(ex.steps + tp.entryArcSteps + tp.leavingArcSteps).toBeLessThanOrEqual(plan.results!.steps.length);
    expect(ex.count === 0).toBe(ex.steps === 0);
    if (ex.count > 0) {
      expect(tp.summary).toContain('in between it leaves the band');
      expect(tp.summary).not.toContain('does not leave the steady cycle');
    } else {
      expect(tp.summary).not.toContain('in between');
    }
  });
});

describe('the net figures of a horizon preview', () => {
  it('carries the net figures and differs from the plan in net cost', async () => {
    const same = await planner.post(`/api/plans/${plan.id}/horizon-preview`).send({ horizonHours: 36 });
    expect(same.status, JSON.stringify(same.body)).toBe(200);
    const p = same.body as HorizonPreview;
    // [D] the same inputs and horizon solved exactly: the same net cost as the plan (within solver tolerance).
    expect(p.planNetCost).toBeCloseTo(plan.results!.summary.netCost!, 9);
    expect(p.netCostDifference!).toBeCloseTo(0, 3);

    const longer = await planner.post(`/api/plans/${plan.id}/horizon-preview`).send({ horizonHours: 48 });
    expect(longer.status, JSON.stringify(longer.body)).toBe(200);
    const q = longer.body as HorizonPreview;
    expect(q.netCost).toBeCloseTo(q.cost - q.storedEnergyChange, 9);
    expect(q.batteryValue).toBeCloseTo(q.noBatteryCost - q.netCost, 9);
    expect(q.netCostDifference!).toBeCloseTo(q.netCost - q.planNetCost!, 9);
    expect(q.costDifference!).toBeCloseTo(q.cost - q.planCost!, 9);
    expect(q.storedEnergyValuation.description).toContain('EUR/MWh');
  });
});
