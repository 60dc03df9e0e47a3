// Heavy cycling (more equivalent full cycles per day than the battery's rating
// allows) is flagged on plans and steady cycles; without a rating above 2 per day.
import { describe, expect, it } from 'vitest';
import { alignInputs } from '../../server/engine/inputs/align-inputs';
import { validateBattery } from '../../server/engine/model/validate-battery';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { COMMON_PRACTICE_CYCLES_PER_DAY, steadyCyclingCheck } from '../../server/engine/plan/cycling-check';
import { solveSteadyCycle } from '../../server/engine/steady/solve-steady-cycle';
import type { BatteryParams } from '../../server/engine/types';
import { battery } from './support/problem-builder';

/** Two UTC days of prices alternating 10 and 100 every hour. */
function sawtooth(b: BatteryParams) {
  const values = Array.from({ length: 48 }, (_, t) => (t % 2 === 0 ? 10 : 100));
  const aligned = alignInputs({
    battery: b,
    site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
    prices: { startMs: Date.UTC(2026, 2, 2), stepMinutes: 60, values },
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  return aligned.inputs;
}

function dayPlan(b: BatteryParams) {
  const inputs = sawtooth(b);
  const result = solvePlan(inputs, {
    startMs: inputs.timesMs[0]!,
    endMs: inputs.timesMs[24]!,
    horizonHours: 24,
    terminal: { kind: 'free' },
    initialSocPct: 0,
  });
  if (!result.ok) throw new Error(result.issue.message);
  return result.plan;
}

describe('heavy cycling', () => {
  it('flags twelve cycles a day against the common-practice 2 when the battery has no rating, and says so', () => {
    // [D] 1 MW / 1 MWh, η = 1, prices 10, 100, 10, 100, …: buying 1 MWh at every 10 and selling it at the next
    // 100 earns 90 each time, twelve times a day: 12 MWh discharged / 1 MWh usable = 12 equivalent full cycles.
    const plan = dayPlan(battery());
    expect(plan.cycling).toMatchObject({
      limitPerDay: COMMON_PRACTICE_CYCLES_PER_DAY,
      limitSource: 'common practice',
      highestDay: '2026-03-02',
      heavy: true,
    });
    expect(plan.cycling.highestPerDay).toBeCloseTo(12, 9);
    expect(plan.cycling.message).toMatch(/^Heavy cycling: on 2026-03-02 the schedule makes 12\.00 equivalent full cycles; /);
    expect(plan.cycling.message).toContain('as is common practice');
    expect(plan.warnings).toContain(plan.cycling.message);
  });

  it("uses the battery's own rating when it has one", () => {
    const within = dayPlan(battery({ maxRatedCyclesPerDay: 12 }));
    expect(within.cycling).toMatchObject({ limitPerDay: 12, limitSource: 'battery rating', heavy: false, message: null });
    expect(within.warnings.join(' ')).not.toContain('Heavy cycling');
    const above = dayPlan(battery({ maxRatedCyclesPerDay: 3 }));
    expect(above.cycling.heavy).toBe(true);
    expect(above.cycling.message).toContain('the battery is rated for 3 per day');
  });

  it('checks the steady cycle, and refuses a rating that is not positive', () => {
    const steady = solveSteadyCycle(sawtooth(battery()));
    if (!steady.ok || steady.cycle.status !== 'optimal') throw new Error('steady cycle failed');
    const check = steadyCyclingCheck(battery(), steady.cycle.equivalentCyclesPerDay);
    expect(check.heavy).toBe(true);
    expect(check.message).toContain('in the steady cycle’s representative day the schedule makes 12.00 equivalent full cycles');
    expect(validateBattery(battery({ maxRatedCyclesPerDay: 0 }))).toMatchObject({ field: 'battery.maxRatedCyclesPerDay' });
    expect(validateBattery(battery({ maxRatedCyclesPerDay: null }))).toBeNull();
  });
});
