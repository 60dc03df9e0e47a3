/**
 * Every bad input for plans gets a clear 422 (what, where, how to
 * fix) and stores nothing; a battery edited while its plan waits in the queue
 * does not change the plan; an infeasible model ends the job with the
 * engine's message on the plan.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import { anonymousAgent, signInAs } from '../support/auth';
import { HOUR_MS, iso, sqlRows } from '../support/api-fixtures';
import { computePlan, createPlace, dailyPrices, type Place, useJobsTestFile, waitUntilFinished } from '../support/jobs';

const jobs = useJobsTestFile('plan_bad_input', { worker: false });
let place: Place;

const start = Date.parse('2026-03-02T00:00:00Z');

beforeAll(async () => {
  place = await createPlace(jobs.planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
});

const validBody = (over: Record<string, unknown> = {}) => ({
  batteryId: place.batteryId,
  priceProfileId: place.priceProfileId,
  deliveryStart: iso(start + 24 * HOUR_MS),
  deliveryEnd: iso(start + 48 * HOUR_MS),
  horizonHours: 24,
  terminalRule: 'free',
  ...over,
});

const storedPlans = async (batteryId: string) =>
  (await sqlRows<{ n: number }>('select count(*)::int as n from plans where battery_id = $1', [batteryId]))[0]!.n;

async function expectRefused(body: Record<string, unknown>, path: string, message: RegExp) {
  const before = await storedPlans(place.batteryId);
  const response = await jobs.planner.post('/api/plans').send(body);
  expect(response.status, JSON.stringify(response.body)).toBe(422);
  expect(response.body.error).toEqual(expect.any(String));
  const issue = (response.body.issues as { path: string; message: string }[]).find((i) => i.path === path);
  expect(issue, JSON.stringify(response.body.issues)).toBeDefined();
  expect(issue!.message).toMatch(message);
  expect(await storedPlans(place.batteryId)).toBe(before);
}

describe('POST /api/plans with bad input', () => {
  it('refuses a delivery window outside the price profile’s period, naming the period', async () => {
    await expectRefused(
      validBody({ deliveryStart: iso(start + 96 * HOUR_MS), deliveryEnd: iso(start + 120 * HOUR_MS) }),
      'deliveryEnd',
      /outside the period of the price profile .*2026-03-02T00:00:00Z – 2026-03-05T00:00:00Z/,
    );
    await expectRefused(
      validBody({ deliveryStart: iso(start - 24 * HOUR_MS), deliveryEnd: iso(start) }),
      'deliveryStart',
      /outside the period/,
    );
  });

  it('refuses a profile from another site, naming both sites', async () => {
    const other = await createPlace(jobs.planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    await expectRefused(
      validBody({ priceProfileId: other.priceProfileId }),
      'priceProfileId',
      /belongs to another site.*Choose a price profile of/,
    );
  });

  it('refuses a price profile given as the load profile', async () => {
    await expectRefused(
      validBody({ loadProfileId: place.priceProfileId }),
      'loadProfileId',
      /is a price profile; loadProfileId needs a load profile/,
    );
  });

  it('refuses a horizon that does not cover the delivery window', async () => {
    await expectRefused(validBody({ horizonHours: 12 }), 'horizonHours', /shorter than the delivery window \(24 h\)/);
  });

  it('refuses a delivery start between two steps of the profile', async () => {
    await expectRefused(
      validBody({ deliveryStart: iso(start + 24.5 * HOUR_MS) }),
      'deliveryStart',
      /must fall on a step .*every 60 minutes/,
    );
  });

  it('refuses an initial SoC outside the battery’s window and a target above its maximum', async () => {
    const battery = (await jobs.planner.get(`/api/batteries/${place.batteryId}`)).body as {
      socMinPct: number;
      socMaxPct: number;
    };
    await expectRefused(validBody({ initialSocPct: battery.socMinPct - 1 }), 'initialSocPct', /outside the SoC window/);
    await expectRefused(validBody({ terminalRule: `target:${battery.socMaxPct + 1}` }), 'terminalRule', /above the maximum SoC/);
  });

  it('refuses an unknown terminal rule and a body with fields it does not know (no mass assignment)', async () => {
    await expectRefused(validBody({ terminalRule: 'empty' }), 'terminalRule', /free, cyclic, steady-value or target/);
    const response = await jobs.planner.post('/api/plans').send(validBody({ status: 'approved' }));
    expect(response.status).toBe(422);
  });

  it('refuses a viewer (403) and nobody signed in (401)', async () => {
    const viewer = await signInAs(jobs.app, 'viewer');
    expect((await viewer.post('/api/plans').send(validBody())).status).toBe(403);
    expect((await anonymousAgent(jobs.app).post('/api/plans').send(validBody())).status).toBe(401);
  });
});

describe('a plan waiting in the queue', () => {
  it('keeps the battery parameters of its snapshot when the battery is edited before a worker takes it', async () => {
    // No worker is running yet: the plan waits while the battery changes.
    const created = await jobs.planner.post('/api/plans').send(validBody({ horizonHours: 48, initialSocPct: 50 }));
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const planId = (created.body as PlanCreated).plan.id;
    const battery = (await jobs.planner.get(`/api/batteries/${place.batteryId}`)).body as {
      version: number;
      powerChargeKw: number;
    };
    expect(battery.powerChargeKw).toBe(1000);
    const edit = await jobs.planner
      .patch(`/api/batteries/${place.batteryId}`)
      .send({ version: battery.version, powerChargeKw: 200, powerDischargeKw: 200 });
    expect(edit.status, JSON.stringify(edit.body)).toBe(200);

    await jobs.startWorker();
    const plan = await waitUntilFinished<Plan>(jobs.planner, `/api/plans/${planId}`);
    expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
    expect(plan.inputs!.battery.powerChargeKw).toBe(1000);
    expect(plan.inputs!.battery.version).toBe(battery.version);
    // [D] The daily spread of these prices makes charging pay, and a 2 MWh battery needs more than
    // 200 kW to use it: the optimum charges above the edited limit, which only the snapshot allows.
    const peakCharge = Math.max(...plan.results!.steps.map((s) => s.chargeKw));
    expect(peakCharge).toBeGreaterThan(200 + 1);
    expect(peakCharge).toBeLessThanOrEqual(1000 + 1e-6);
  });

  it('ends with the engine’s message on the plan when the model is infeasible', async () => {
    // [D] Load 2000 kW against an import limit of 100 kW and 1000 kW of discharge: no schedule balances the site.
    const infeasible = await createPlace(jobs.planner, {
      prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 },
      load: { values: Array.from({ length: 72 }, () => 2000), startMs: start, stepMinutes: 60 },
      site: { importLimitKw: 100, exportLimitKw: 100 },
    });
    await jobs.startWorker();
    const plan = await computePlan(jobs.planner, {
      ...validBody(),
      batteryId: infeasible.batteryId,
      priceProfileId: infeasible.priceProfileId,
      loadProfileId: infeasible.loadProfileId,
    });
    expect(plan.job?.state).toBe('failed');
    expect(plan.results).toBeNull();
    expect(plan.errorMessage).toMatch(/^The plan could not be computed: .{10,}/);
    // The engine's own words, naming the limit, reach the plan page.
    expect(plan.errorMessage).toMatch(/exceeds the import limit \(100 kW\)/);
    expect(plan.job?.error).toBe(plan.errorMessage);
    // Deterministic: no retry was spent on it.
    expect(plan.job?.attempt).toBe(1);
  });
});
