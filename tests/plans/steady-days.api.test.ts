/**
 * The steady cycle from weekdays or weekend days only ("Offer
 * weekday/weekend representative days as an option"), through POST /api/plans and
 * POST /api/studies, the jobs and the stored results.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Plan } from '@shared/schemas/plan';
import type { Study } from '@shared/schemas/study';
import { HOUR_MS, iso } from '../support/api-fixtures';
import { computePlan, computeStudy, createPlace, exactPathBattery, type Place, useJobsTestFile } from '../support/jobs';

const jobs = useJobsTestFile('steady_days');

const monday = Date.parse('2026-03-02T00:00:00Z'); // a Monday; the test sites keep UTC
// Invented shapes: weekdays peak in the evening, weekends are flat with a midday dip.
const weekdayDay = Array.from({ length: 24 }, (_, h) => (h < 6 ? 30 : h >= 17 && h < 21 ? 120 : 60));
const weekendDay = Array.from({ length: 24 }, (_, h) => (h >= 11 && h < 15 ? 20 : 45));
const days = (count: number, pick: (day: number) => number[]) => Array.from({ length: count }, (_, d) => pick(d)).flat();
const isWeekend = (day: number) => day % 7 >= 5;
const battery = exactPathBattery({ efficiencyCharge: 0.95, efficiencyDischarge: 0.95 });

let mixed: Place;
let weekdaysOnly: Place;

async function plan(place: Place, extra: Record<string, unknown>): Promise<Plan> {
  return computePlan(jobs.planner, {
    batteryId: place.batteryId,
    priceProfileId: place.priceProfileId,
    // Tuesday 3 March (a weekday) until noon: the steady-value end prices the energy kept for the evening.
    deliveryStart: iso(monday + 24 * HOUR_MS),
    deliveryEnd: iso(monday + 36 * HOUR_MS),
    horizonHours: 12,
    terminalRule: 'steady-value',
    initialSocPct: 50,
    ...extra,
  });
}

const steadySoc = (p: Plan) => p.results!.steps.map((s) => s.steadySocKwh);

beforeAll(async () => {
  mixed = await createPlace(jobs.planner, {
    prices: { values: days(14, (d) => (isWeekend(d) ? weekendDay : weekdayDay)), startMs: monday, stepMinutes: 60 },
    battery,
  });
  weekdaysOnly = await createPlace(jobs.planner, {
    prices: { values: days(14, () => weekdayDay), startMs: monday, stepMinutes: 60 },
    battery,
  });
});

describe('the steady cycle of a plan', () => {
  it('from weekdays only is the steady cycle of the weekday shape alone; from every day it differs', async () => {
    const weekday = await plan(mixed, { steadyDays: 'weekday' });
    expect(weekday.job?.state, weekday.errorMessage ?? '').toBe('completed');
    expect(weekday.inputs?.steadyDays).toBe('weekday');
    expect(weekday.results!.notes).toContain('averaged over 10 weekday days by local clock slot');
    // [D] Every weekday has the same prices, so the weekday average is that day's shape: the same
    // steady cycle as a profile made of weekdays only, averaged over every day.
    const reference = await plan(weekdaysOnly, {});
    expect(reference.inputs?.steadyDays).toBe('all');
    // (An average of ten equal prices may differ from the price in its last bit: compare to 1e-6 kWh.)
    expect(steadySoc(weekday)).toEqual(steadySoc(reference).map((kwh) => expect.closeTo(kwh!, 6)));
    expect(weekday.results!.steadyCycle!.costPerDay).toBeCloseTo(reference.results!.steadyCycle!.costPerDay, 9);
    // ... and the plans, whose prices and steady-value end agree, too.
    expect(weekday.results!.summary.cost).toBeCloseTo(reference.results!.summary.cost, 9);

    const everyDay = await plan(mixed, {});
    expect(everyDay.results!.notes).toContain('averaged over 14 days by local clock slot');
    expect(steadySoc(everyDay)).not.toEqual(steadySoc(weekday));

    // The horizon preview re-solves with the plan's own steady cycle: at the plan's horizon it
    // gives the plan's cost, which the every-day cycle's steady-value end would not.
    expect(Math.abs(everyDay.results!.summary.cost - weekday.results!.summary.cost)).toBeGreaterThan(1);
    const preview = await jobs.planner.post(`/api/plans/${weekday.id}/horizon-preview`).send({ horizonHours: 12 });
    expect(preview.status, JSON.stringify(preview.body)).toBe(200);
    expect(preview.body.cost).toBeCloseTo(weekday.results!.summary.cost, 9);
  });

  it('from weekend days fails with the engine’s reason when the data hold no whole weekend day', async () => {
    const friday = await createPlace(jobs.planner, {
      prices: { values: days(5, () => weekdayDay), startMs: monday, stepMinutes: 60 },
      battery,
    });
    const failed = await plan(friday, { steadyDays: 'weekend' });
    expect(failed.job?.state).toBe('failed');
    expect(failed.errorMessage).toMatch(
      /the representative weekend day has no data for the 00:00 slot: the profile must cover at least one whole weekend day/,
    );
    expect(failed.results).toBeNull();
  });

  it('refuses an unknown choice with 422, naming the field and the choices', async () => {
    const response = await jobs.planner.post('/api/plans').send({
      batteryId: mixed.batteryId,
      priceProfileId: mixed.priceProfileId,
      deliveryStart: iso(monday + 24 * HOUR_MS),
      deliveryEnd: iso(monday + 48 * HOUR_MS),
      horizonHours: 24,
      terminalRule: 'free',
      steadyDays: 'sundays',
    });
    expect(response.status).toBe(422);
    expect(response.body.issues).toContainEqual(
      expect.objectContaining({
        path: 'steadyDays',
        message: 'Choose which days the steady cycle averages: all, weekday or weekend.',
      }),
    );
  });

  it('of a horizon study from weekdays only prices the steady-value end as the weekday shape alone would', async () => {
    // Tuesday and Wednesday, re-planned hourly with lookaheads of 1 to 6 h: every window ends on a weekday, and
    // with short lookaheads the value of the energy at the end decides what is done now.
    const study = async (place: Place, extra: Record<string, unknown>) => {
      const done = await computeStudy(jobs.planner, {
        batteryId: place.batteryId,
        priceProfileId: place.priceProfileId,
        start: iso(monday + 24 * HOUR_MS),
        end: iso(monday + 72 * HOUR_MS),
        horizonsHours: [1, 3, 6],
        replanHours: 1,
        terminalRules: ['steady-value'],
        initialSocPct: 50,
        ...extra,
      });
      expect(done.job?.state, done.errorMessage ?? '').toBe('completed');
      return done;
    };
    const costs = (s: Study) => s.results!.runs.map((r) => r.cost!);
    const weekday = await study(mixed, { steadyDays: 'weekday' });
    expect(weekday.inputs?.steadyDays).toBe('weekday');
    // [D] Same prices over the period and the same steady cycle (see above): the same realised costs.
    const reference = await study(weekdaysOnly, {});
    expect(costs(weekday)).toEqual(costs(reference).map((c) => expect.closeTo(c, 6)));
    // The every-day cycle values the end energy otherwise, so at least one run differs.
    const everyDay = await study(mixed, {});
    expect(costs(everyDay).some((c, i) => Math.abs(c - costs(weekday)[i]!) > 1e-3)).toBe(true);
  });
});
