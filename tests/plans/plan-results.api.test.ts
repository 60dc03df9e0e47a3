/**
 * Plans end to end: POST /api/plans → pg-boss job → worker thread → engine →
 * results stored once → GET /api/plans/:id, against the real test database.
 * Checked against a published worked example and an independent LP solver.
 */
import { describe, expect, it } from 'vitest';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import { optimalArbitrageProfit } from '../support/reference-lp';
import { HOUR_MS, iso, sqlRows } from '../support/api-fixtures';
import { computePlan, createPlace, dailyPrices, useJobsTestFile, waitUntilFinished } from '../support/jobs';

const jobs = useJobsTestFile('plan_results');

const start = Date.parse('2026-03-02T00:00:00Z');
// A battery exactly as in the worked fixtures: 1 MW / 1 MWh, η = 0.9 each way, SoC window 0–100 %.
const fixtureBattery = {
  energyKwh: 1000,
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  efficiencyCharge: 0.9,
  efficiencyDischarge: 0.9,
  socMinPct: 0,
  socMaxPct: 100,
  socInitialPct: 0,
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
};

describe('a plan computed by a background job', () => {
  it('earns 61 on prices [20, 100] with a 1 MW / 1 MWh battery starting empty', async () => {
    // [S] worked fixture A (checked with an independent LP solver): charge 1 MW at 20,
    // discharge 0.81 MW at 100: 0.81·100 − 1·20 = 61. The profile repeats [20, 100] for two days.
    const prices = Array.from({ length: 48 }, (_, i) => (i % 2 === 0 ? 20 : 100));
    const place = await createPlace(jobs.planner, {
      prices: { values: prices, startMs: start, stepMinutes: 60 },
      battery: fixtureBattery,
    });
    const created = await jobs.planner.post('/api/plans').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: iso(start),
      deliveryEnd: iso(start + 2 * HOUR_MS),
      horizonHours: 2,
      terminalRule: 'free',
      initialSocPct: 0,
    });
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const body = created.body as PlanCreated;
    expect(body.job.state).toBe('queued');
    expect(body.plan.status).toBe('draft');

    const plan = await waitUntilFinished<Plan>(jobs.planner, `/api/plans/${body.plan.id}`);
    expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
    expect(plan.job?.shareDone).toBe(1);
    const results = plan.results!;
    expect(results.summary.cost).toBeCloseTo(-61, 6);
    expect(results.summary.earnings).toBeCloseTo(61, 6);
    expect(results.steps.map((s) => s.chargeKw)).toEqual([expect.closeTo(1000, 6), expect.closeTo(0, 6)]);
    expect(results.steps[1]!.dischargeKw).toBeCloseTo(810, 6);
    expect(['dp', 'lp']).toContain(results.method);
    expect(plan.method).toBe(results.method);
  });

  it('matches the optimum of an independent LP solver over the whole horizon, lookahead marked apart from the delivery window', async () => {
    const prices = dailyPrices(4).map((p, i) => p + ((i * 37) % 11) - 5);
    const battery = {
      ...fixtureBattery,
      energyKwh: 2000,
      socMinPct: 10,
      socMaxPct: 90,
      socInitialPct: 50,
      efficiencyCharge: 0.95,
      efficiencyDischarge: 0.92,
    };
    const place = await createPlace(jobs.planner, { prices: { values: prices, startMs: start, stepMinutes: 60 }, battery });
    const plan = await computePlan(jobs.planner, {
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: iso(start + 24 * HOUR_MS),
      deliveryEnd: iso(start + 48 * HOUR_MS),
      horizonHours: 36,
      terminalRule: 'free',
      initialSocPct: 50,
    });
    expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
    const steps = plan.results!.steps;
    expect(steps).toHaveLength(36);
    expect(steps.filter((s) => s.delivery)).toHaveLength(24);
    expect(steps.slice(24).every((s) => !s.delivery)).toBe(true);
    // [D] Pure arbitrage: money paid over the horizon is Σ p·(c − d)·Δt/1000; the independent LP maximises its negative.
    const paid = steps.reduce((sum, s) => sum + (s.priceImport * (s.chargeKw - s.dischargeKw)) / 1000, 0);
    const best = optimalArbitrageProfit({
      prices: prices.slice(24, 60),
      stepHours: 1,
      powerKw: 1000,
      energyKwh: 2000,
      socMinPct: 10,
      socMaxPct: 90,
      etaCharge: 0.95,
      etaDischarge: 0.92,
      initialKwh: 1000,
    });
    expect(-paid).toBeCloseTo(best, 4);
    // Every step stays inside the battery's limits.
    for (const s of steps) {
      expect(s.socPct).toBeGreaterThanOrEqual(10 - 1e-6);
      expect(s.socPct).toBeLessThanOrEqual(90 + 1e-6);
      expect(s.chargeKw).toBeLessThanOrEqual(1000 + 1e-6);
    }
    expect(plan.results!.turnpike.summary).toMatch(/^Stays near the steady cycle \d+ % of the time/);

    // No demand charge, no cycle cap: the engine takes the exact fast path and adds what only it knows.
    expect(plan.method).toBe('dp');
    const dh = plan.results!.decisionHorizonHours!;
    expect(dh).toBeGreaterThan(0);
    expect(dh).toBeLessThanOrEqual(36);
    const curves = plan.results!.valueCurves;
    expect(curves[0]!.time).toBe(iso(start + 24 * HOUR_MS));
    // [D] The cost-to-go V(e) is convex in the stored energy, so the value of one more MWh, −V′(e),
    // never rises as the SoC rises: every curve is non-increasing in SoC.
    for (const curve of curves) {
      for (let i = 1; i < curve.points.length; i++) {
        expect(curve.points[i]!.socPct).toBeGreaterThanOrEqual(curve.points[i - 1]!.socPct - 1e-9);
        expect(curve.points[i]!.value).toBeLessThanOrEqual(curve.points[i - 1]!.value + 1e-6);
      }
    }
  });

  it('stores the results once with one audit event, and records who created the plan', async () => {
    const prices = dailyPrices(3);
    const place = await createPlace(jobs.planner, { prices: { values: prices, startMs: start, stepMinutes: 60 } });
    const created = await jobs.planner.post('/api/plans').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: iso(start),
      deliveryEnd: iso(start + 24 * HOUR_MS),
      horizonHours: 48,
      terminalRule: 'steady-value',
    });
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const id = (created.body as PlanCreated).plan.id;
    await waitUntilFinished<Plan>(jobs.planner, `/api/plans/${id}`);
    const events = await sqlRows<{ action: string; actor_id: string | null }>(
      'select action, actor_id from audit_events where entity_id = $1 order by id',
      [id],
    );
    expect(events.map((e) => e.action)).toEqual(['plan.created', 'plan.computed']);
    expect(events[0]!.actor_id).toBe(jobs.planner.user.id);
    const [row] = await sqlRows<{ results_input_version: number; initial_soc_pct: number }>(
      'select results_input_version, initial_soc_pct from plans where id = $1',
      [id],
    );
    expect(row!.results_input_version).toBe(1);
    // No SoC in the request and no approved plan yet: the battery's own initial SoC (the lithium-ion default).
    const battery = await jobs.planner.get(`/api/batteries/${place.batteryId}`);
    expect(row!.initial_soc_pct).toBe(battery.body.socInitialPct);
  });
});
