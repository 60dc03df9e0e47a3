// Bad inputs of the operating limits: each is refused before solving with what
// is wrong, where (step and local time, or file line) and how to fix it; a
// reserve duration the usable energy cannot sustain is a warning naming the limit.
import { describe, expect, it } from 'vitest';
import { parseProfileCsv } from '../../../shared/profile-csv';
import { solveDispatch } from '../../../server/engine/dispatch/solve-dispatch';
import { alignInputs } from '../../../server/engine/inputs/align-inputs';
import { solvePlan } from '../../../server/engine/plan/solve-plan';
import { reserveDurationWarnings } from '../../../server/engine/limits/limit-words';
import { battery, problem } from '../support/problem-builder';

const prices = [20, 100, 30, 90, 10, 120];
const base = problem(prices, { battery: battery({ energyKwh: 2000, socInitialPct: 50 }) });

describe('operating limits refused with the step at fault', () => {
  it('names the stretch a reserve price profile does not cover', () => {
    const s = solveDispatch({ ...base, reserveUpPrice: [5, 5, NaN, NaN, 5, 5], reserveHours: 1 });
    expect(s.status).toBe('error');
    expect(s.message).toMatch(/upward reserve price profile does not cover the window: no price from step 2 \(2026-01-01 02:00/);
    expect(s.message).toMatch(/to step 3 \(2026-01-01 03:00/);
  });

  it('refuses a plan whose window runs past the reserve prices, naming the first missing interval (a 422 later)', () => {
    const startMs = Date.UTC(2026, 4, 4);
    const hourly = (values: number[], from = startMs) => ({ startMs: from, stepMinutes: 60, values });
    const aligned = alignInputs({
      battery: battery({ energyKwh: 2000, socInitialPct: 50 }),
      site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
      prices: hourly(Array.from({ length: 48 }, (_, t) => 50 + 30 * Math.sin(t / 3))),
      reserveDownPrices: hourly(Array.from({ length: 30 }, () => 4)),
      reserveHours: 1,
    });
    expect(aligned.ok).toBe(true);
    if (!aligned.ok) return;
    // The reserve prices end at hour 30; the price data (and the period) do not shrink to them.
    expect(aligned.inputs.timesMs).toHaveLength(48);
    const result = solvePlan(aligned.inputs, {
      startMs: startMs + 12 * 3_600_000,
      endMs: startMs + 36 * 3_600_000,
      horizonHours: 24,
      terminal: { kind: 'free' },
    });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issue.message).toMatch(
      /downward reserve price profile does not cover the window: no price from step 18 \(2026-05-05 06:00/,
    );
  });

  it('refuses availability outside 0–1 or missing, naming the step', () => {
    const high = solveDispatch({ ...base, availability: [1, 1.2, 1, 1, 1, 1] });
    expect(high.status).toBe('error');
    expect(high.message).toMatch(
      /availability at step 1 \(2026-01-01 01:00 \+00:00\) is 1.2; it must be a fraction between 0 and 1/,
    );
    const missing = solveDispatch({ ...base, availability: [1, 1, 1, NaN, 1, 1] });
    expect(missing.message).toMatch(/availability profile does not cover the window: no value from step 3/);
  });

  it('says when a ramp rate makes the first interval unreachable from the given initial power, naming it', () => {
    const s = solveDispatch({
      ...base,
      battery: { ...base.battery, rampKwPerMin: 2 },
      initialNetPowerKw: 900,
      availability: [0.4, 1, 1, 1, 1, 1],
    });
    expect(s.status).toBe('error');
    // [D] 2 kW/min over a 60-minute step: ±120 kW, so 780–1020 kW; availability 0.4 of 1000 kW allows −400–400 kW.
    expect(s.message).toContain('the ramp rate 2 kW/min lets the net power change by at most 120 kW per interval');
    expect(s.message).toContain('from the given initial net power 900 kW it must stay within 780 kW to 1020 kW');
    expect(s.message).toContain(
      'step 0 (2026-01-01 00:00 +00:00), the first interval, but that interval allows only -400 kW to 400 kW',
    );
  });

  it('refuses reserve prices without a delivery duration, and a negative ramp rate', () => {
    expect(solveDispatch({ ...base, reserveUpPrice: prices.map(() => 3) }).message).toMatch(
      /reserves need a delivery duration \(reserveHours\)/,
    );
    expect(solveDispatch({ ...base, battery: { ...base.battery, rampKwPerMin: -1 } }).message).toMatch(
      /battery.rampKwPerMin is -1; it must be more than 0 kW per minute, or null/,
    );
  });

  it('warns when the reserve duration is longer than the usable energy allows at full power, naming the limit', () => {
    // [D] 2 MW / 4 MWh, SoC 10–90 %: 3 200 kWh usable; up: 3 200·0.922/2 000 = 1.48 h at full power; for 2 h the
    // upward reserve is limited to 3 200·0.922/2 = 1 475 kW; down: 3 200/(0.922·2 000) = 1.74 h, 3 200/(0.922·2) = 1 735 kW.
    const b = battery({ powerChargeKw: 2000, powerDischargeKw: 2000, energyKwh: 4000, socMinPct: 10, socMaxPct: 90 });
    const demo = { ...b, efficiencyCharge: 0.922, efficiencyDischarge: 0.922 };
    const warnings = reserveDurationWarnings(demo, 2);
    expect(warnings).toHaveLength(2);
    expect(warnings[0]).toContain('3200 kWh usable sustain 2000 kW of upward reserve for only 1.48 h');
    expect(warnings[0]).toContain('upward reserve is limited to 1475 kW');
    expect(warnings[1]).toContain('downward reserve is limited to 1735 kW');
    expect(reserveDurationWarnings(demo, 1)).toEqual([]);
  });
});

describe('availability profile files', () => {
  const read = (body: string, unit = 'fraction') =>
    parseProfileCsv(`timestamp,availability\n${body}`, { kind: 'availability', unit, timezone: 'UTC' });

  it('rejects values outside 0–1 and NaN, each with its line', () => {
    const result = read(
      '2026-05-04T00:00:00Z,1\n2026-05-04T01:00:00Z,1.5\n2026-05-04T02:00:00Z,NaN\n2026-05-04T03:00:00Z,-0.2\n',
    );
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues.map((i) => i.line)).toEqual([3, 4, 5]);
    expect(result.issues[0]!.message).toContain('the availability 1.5 is outside 0–1');
    expect(result.issues[1]!.message).toContain('"NaN" is not a finite number');
    expect(result.hint).toContain('Nothing was stored');
  });

  it('reads percentages as fractions and refuses 120 %', () => {
    const ok = read('2026-05-04T00:00:00Z,50\n2026-05-04T01:00:00Z,100\n', '%');
    expect(ok.ok && ok.profile.values).toEqual([0.5, 1]);
    const bad = read('2026-05-04T00:00:00Z,50\n2026-05-04T01:00:00Z,120\n', '%');
    expect(!bad.ok && bad.issues[0]).toEqual({
      line: 3,
      message: expect.stringContaining('the availability 120 % is outside 0–100 %'),
    });
  });

  it('reads reserve prices per MW per hour, and per kW per hour ×1000', () => {
    const perKw = parseProfileCsv('timestamp,price\n2026-05-04T00:00:00Z,0.005\n2026-05-04T01:00:00Z,0.01\n', {
      kind: 'reserve-up-price',
      unit: 'currency/kW/h',
      timezone: 'UTC',
    });
    expect(perKw.ok && perKw.profile).toMatchObject({ values: [5, 10], unit: 'currency/MW/h' });
  });
});
