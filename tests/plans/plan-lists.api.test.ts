/**
 * Reading plans: lists filtered by site, status, job state and delivery window
 * (the comparison by horizon), the background-job list of the home page, and
 * the plan form's defaults: the initial SoC comes from the battery until a
 * plan is approved, then from that plan's end SoC.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Plan, PlanCreated, PlanDefaults } from '@shared/schemas/plan';
import type { JobListItem } from '@shared/schemas/job';
import { signInAs, type SignedInAgent } from '../support/auth';
import { HOUR_MS, iso } from '../support/api-fixtures';
import { computePlan, createPlace, dailyPrices, type Place, useJobsTestFile } from '../support/jobs';

const jobs = useJobsTestFile('plan_lists');
let approver: SignedInAgent;
let viewer: SignedInAgent;
let place: Place;
const start = Date.parse('2026-03-02T00:00:00Z');
const window1 = { deliveryStart: iso(start), deliveryEnd: iso(start + 24 * HOUR_MS) };

async function makePlan(horizonHours: number, terminalRule: string, window = window1): Promise<Plan> {
  return computePlan(jobs.planner, {
    batteryId: place.batteryId,
    priceProfileId: place.priceProfileId,
    ...window,
    horizonHours,
    terminalRule,
  });
}

beforeAll(async () => {
  [approver, viewer] = await Promise.all([signInAs(jobs.app, 'approver'), signInAs(jobs.app, 'viewer')]);
  place = await createPlace(jobs.planner, { prices: { values: dailyPrices(5), startMs: start, stepMinutes: 60 } });
});

describe('plan lists', () => {
  it('lists the plans of one delivery window by horizon for the comparison, without their series', async () => {
    const plans = [await makePlan(24, 'free'), await makePlan(48, 'free'), await makePlan(48, 'steady-value')];
    await makePlan(24, 'free', { deliveryStart: iso(start + 24 * HOUR_MS), deliveryEnd: iso(start + 48 * HOUR_MS) });
    const q = new URLSearchParams({ batteryId: place.batteryId, ...window1 });
    const response = await viewer.get(`/api/plans?${q.toString()}`);
    expect(response.status).toBe(200);
    const listed = response.body as Plan[];
    expect(listed.map((p) => p.id).sort()).toEqual(plans.map((p) => p.id).sort());
    for (const item of listed) {
      expect(item.results).toBeUndefined();
      expect(item.headline?.nearSteadyShare).toEqual(expect.any(Number));
      expect(item.job?.state).toBe('completed');
    }
  });

  it('filters by site, sign-off status and job state, and refuses an unknown status', async () => {
    const bySite = (await viewer.get(`/api/plans?siteId=${place.siteId}`)).body as Plan[];
    expect(bySite.length).toBeGreaterThanOrEqual(4);
    expect(bySite.every((p) => p.siteId === place.siteId)).toBe(true);
    expect(((await viewer.get(`/api/plans?siteId=${place.siteId}&status=approved`)).body as Plan[]).length).toBe(0);
    expect(((await viewer.get(`/api/plans?siteId=${place.siteId}&jobState=failed`)).body as Plan[]).length).toBe(0);
    expect(((await viewer.get(`/api/plans?siteId=${place.siteId}&jobState=completed`)).body as Plan[]).length).toBe(
      bySite.length,
    );
    const bad = await viewer.get('/api/plans?status=finished');
    expect(bad.status).toBe(422);
    expect(bad.body.issues[0].path).toBe('status');
  });

  it('lists finished jobs with what they computed, and refuses an unknown state', async () => {
    const jobs = (await viewer.get('/api/jobs?state=completed&kind=plan&limit=200')).body as JobListItem[];
    const ours = jobs.filter((j) => j.siteId === place.siteId);
    expect(ours.length).toBeGreaterThanOrEqual(4);
    expect(ours[0]!.label).toMatch(/^Plan for Unit 1, 2026-03-0\d 00:00 – 2026-03-0\d 00:00 UTC$/);
    expect((await viewer.get('/api/jobs?state=stuck')).status).toBe(422);
  });
});

describe('the plan form’s initial SoC', () => {
  it('is the battery’s own until a plan is approved, then the approved plan’s end SoC', async () => {
    const battery = (await jobs.planner.get(`/api/batteries/${place.batteryId}`)).body as { socInitialPct: number };
    const next = iso(start + 24 * HOUR_MS);
    const before = (
      await jobs.planner.get(`/api/batteries/${place.batteryId}/plan-defaults?deliveryStart=${encodeURIComponent(next)}`)
    ).body as PlanDefaults;
    expect(before).toMatchObject({ initialSocPct: battery.socInitialPct, initialSocSource: 'battery', initialSocPlanId: null });

    // A cyclic plan ends where it starts; a free one sells off: use a target to know the end SoC.
    const plan = await makePlan(24, 'target:70');
    expect(plan.results!.summary.endSocPct).toBeGreaterThanOrEqual(70 - 1e-6);
    const submitted = await jobs.planner.post(`/api/plans/${plan.id}/submit`).send({ version: plan.version });
    expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
    const approved = await approver.post(`/api/plans/${plan.id}/approve`).send({ version: submitted.body.version });
    expect(approved.status, JSON.stringify(approved.body)).toBe(200);

    const after = (
      await jobs.planner.get(`/api/batteries/${place.batteryId}/plan-defaults?deliveryStart=${encodeURIComponent(next)}`)
    ).body as PlanDefaults;
    expect(after.initialSocSource).toBe('last-approved-plan');
    expect(after.initialSocPlanId).toBe(plan.id);
    expect(after.initialSocPct).toBeCloseTo(plan.results!.summary.endSocPct, 9);

    // A new plan for the next day without an initial SoC starts there, and says so in its snapshot.
    const created = await jobs.planner.post('/api/plans').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: next,
      deliveryEnd: iso(start + 48 * HOUR_MS),
      horizonHours: 24,
      terminalRule: 'free',
    });
    const made = (created.body as PlanCreated).plan;
    expect(made.initialSocPct).toBeCloseTo(plan.results!.summary.endSocPct, 9);
    const detail = (await jobs.planner.get(`/api/plans/${made.id}`)).body as Plan;
    expect(detail.inputs?.initialSocSource).toBe('last-approved-plan');
    expect(detail.inputs?.initialSocPlanId).toBe(plan.id);
  });

  it('answers 404 for a battery that does not exist', async () => {
    expect((await jobs.planner.get('/api/batteries/00000000-0000-4000-8000-000000000000/plan-defaults')).status).toBe(404);
  });
});
