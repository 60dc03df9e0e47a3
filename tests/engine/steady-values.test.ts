// The steady cycle's stored-energy value λ̄ of slot j is the value of energy
// held at the END of slot j (the convention of a plan's λ_t). Checked against
// the KKT threshold rule, finite differences of an independently written LP, a
// hand-derived day, and steady-value plans solved by an independent LP.
import { describe, expect, it } from 'vitest';
import { alignInputs } from '../../server/engine/inputs/align-inputs';
import { problemFor } from '../../server/engine/inputs/problem-for';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { solveSteadyCycle, steadyValueAt, type SteadyCycle } from '../../server/engine/steady/solve-steady-cycle';
import { minuteOfDayAt } from '../../server/engine/terminal/terminal-choice';
import { battery } from './support/problem-builder';
import { randomSteadyCase, type SteadyCaseOptions } from './support/random-steady';
import { referenceLp, solveLpWithGlpk } from '../support/reference-lp';
import { xorshiftRandom as seeded } from '../support/seeded-random';
import type { AlignedInputs } from '../../server/engine/inputs/align-inputs';

function steadyOf(inputs: AlignedInputs): SteadyCycle {
  const result = solveSteadyCycle(inputs);
  if (!result.ok) throw new Error(result.issue.message);
  if (result.cycle.status !== 'optimal') throw new Error(result.cycle.message);
  return result.cycle;
}

type Kind = 'idle' | 'partial' | 'full';

/**
 * [D] REFERENCES, KKT threshold rule, for pure arbitrage (one price p_t, no grid limits): the reduced costs
 * of c_t and d_t are (p_t − η_ch·λ_t)·Δt/1000 and (c_deg − p_t + λ_t/η_dis)·Δt/1000, with λ_t the dual of
 * the SoC row of e_{t+1}. Charging (c_t > 0) needs λ_t ≥ p_t/η_ch, charging below full power λ_t ≤ p_t/η_ch;
 * discharging (d_t > 0) needs λ_t ≤ η_dis·(p_t − c_deg), below full power λ_t ≥ η_dis·(p_t − c_deg).
 * Idle: η_dis·(p_t − c_deg) ≤ λ_t ≤ p_t/η_ch. These hold for every optimal dual, at a bound of the SoC too.
 */
function kktBounds(cycle: SteadyCycle, inputs: AlignedInputs, k: number): { low: number; high: number; kind: Kind } {
  const b = inputs.battery;
  const slot = cycle.slots[k]!;
  const p = slot.priceImport;
  const tolC = 1e-6 * Math.max(1, b.powerChargeKw);
  const tolD = 1e-6 * Math.max(1, b.powerDischargeKw);
  const chargeThreshold = p / b.efficiencyCharge;
  const dischargeThreshold = b.efficiencyDischarge * (p - b.degradationCostPerMwh);
  let low = -Infinity;
  let high = Infinity;
  if (slot.chargeKw > tolC) low = Math.max(low, chargeThreshold);
  if (slot.chargeKw < b.powerChargeKw - tolC) high = Math.min(high, chargeThreshold);
  if (slot.dischargeKw > tolD) high = Math.min(high, dischargeThreshold);
  if (slot.dischargeKw < b.powerDischargeKw - tolD) low = Math.max(low, dischargeThreshold);
  const moving = slot.chargeKw > tolC || slot.dischargeKw > tolD;
  const full = slot.chargeKw > b.powerChargeKw - tolC || slot.dischargeKw > b.powerDischargeKw - tolD;
  return { low, high, kind: !moving ? 'idle' : full ? 'full' : 'partial' };
}

const variants: (SteadyCaseOptions & { count: number })[] = [
  { stepMinutes: 60, lossless: true, count: 40 },
  { stepMinutes: 60, lossless: false, count: 40 },
  { stepMinutes: 15, lossless: true, count: 10 },
  { stepMinutes: 15, lossless: false, count: 10 },
];

describe('steady cycle stored-energy values', () => {
  it.each(variants)(
    'lie within the KKT bounds of every slot ($stepMinutes-minute slots, lossless $lossless)',
    ({ count, ...options }) => {
      const seen: Record<Kind, number> = { idle: 0, partial: 0, full: 0 };
      for (let seed = 1; seed <= count; seed++) {
        const { inputs } = randomSteadyCase(7000 + seed, options);
        const cycle = steadyOf(inputs);
        cycle.slots.forEach((slot, k) => {
          const { low, high, kind } = kktBounds(cycle, inputs, k);
          seen[kind]++;
          const tol = 1e-6 * (1 + Math.abs(slot.priceImport));
          for (const value of [slot.storedEnergyValue, slot.storedEnergyValueRange.low, slot.storedEnergyValueRange.high]) {
            expect(value, `seed ${7000 + seed} slot ${slot.time} (${kind})`).toBeGreaterThanOrEqual(low - tol);
            expect(value, `seed ${7000 + seed} slot ${slot.time} (${kind})`).toBeLessThanOrEqual(high + tol);
          }
        });
      }
      expect(Math.min(seen.idle, seen.partial, seen.full)).toBeGreaterThan(count / 2);
    },
  );

  const fdVariants: (SteadyCaseOptions & { count: number })[] = [
    { stepMinutes: 60, lossless: true, count: 8 },
    { stepMinutes: 60, lossless: false, count: 8 },
    { stepMinutes: 60, lossless: false, site: true, count: 8 },
    { stepMinutes: 60, lossless: false, coupling: 'cap', count: 5 },
    { stepMinutes: 60, lossless: false, site: true, coupling: 'demand', count: 5 },
    { stepMinutes: 15, lossless: false, count: 2 },
  ];

  it.each(fdVariants)(
    'equal the finite-difference derivative of the steady cost where it is unique (%o)',
    ({ count, ...options }) => {
      // [D] LP sensitivity: the steady cost z(δ) with δ kWh handed to the battery at the end of slot j (the
      // right side of the SoC row of e_{j+1}) is convex and piecewise linear, so the secants over +h and −h
      // enclose every optimal value, −1000·(z(h) − z)/h ≤ λ̄_j ≤ 1000·(z(−h) − z)/h, and where both secants
      // agree the derivative is unique and λ̄_j must equal it. z comes from GLPK on the LP written out in
      // tests/support/reference-lp.ts, not from the engine's model builder.
      let unique = 0;
      for (let seed = 1; seed <= count; seed++) {
        const { inputs, problem } = randomSteadyCase(8100 + seed, options);
        const cycle = steadyOf(inputs);
        const base = solveLpWithGlpk(referenceLp(problem));
        expect(base.status).toBe('optimal');
        expect(cycle.costPerDay).toBeCloseTo(base.objective, 6);
        const h = 1e-3 * inputs.battery.energyKwh;
        cycle.slots.forEach((slot, j) => {
          const up = solveLpWithGlpk(referenceLp(problem, { inject: { step: j, deltaKwh: h } }));
          const down = solveLpWithGlpk(referenceLp(problem, { inject: { step: j, deltaKwh: -h } }));
          if (up.status !== 'optimal' || down.status !== 'optimal') return;
          const right = (-1000 * (up.objective - base.objective)) / h;
          const left = (1000 * (down.objective - base.objective)) / h;
          const v = slot.storedEnergyValue;
          const tol = 1e-5 * (1 + Math.abs(v));
          const where = `seed ${8100 + seed} slot ${slot.time}`;
          expect(slot.storedEnergyValueRange.low, where).toBeGreaterThanOrEqual(right - tol);
          expect(slot.storedEnergyValueRange.high, where).toBeLessThanOrEqual(left + tol);
          expect(v, where).toBeGreaterThanOrEqual(slot.storedEnergyValueRange.low - tol);
          expect(v, where).toBeLessThanOrEqual(slot.storedEnergyValueRange.high + tol);
          if (Math.abs(left - right) <= 1e-6 * (1 + Math.abs(left))) {
            expect(v, where).toBeCloseTo(right, 4);
            unique++;
          }
        });
      }
      expect(unique).toBeGreaterThan(count * 4);
    },
  );

  it('gives the hand-derived values of a lossless day with an idle slot at 50', () => {
    // [D] 1 MW / 1 MWh, η = 1, SoC 0–100 %, hourly prices 10, 50, 90, then 60 for the other 21 hours. The best
    // periodic day buys 1 MWh at 00:00 (10), holds it through 01:00 and sells it at 02:00 (90): −80 per day.
    // λ̄_j is the value of one kWh held at the end of slot j:
    //   01:00, idle at 50 while full: one kWh more is sold at 50 in that slot, one less is bought at 50
    //     there (cheaper than selling less at 02:00): exactly 50. (A value one slot late, the end of 02:00,
    //     would be 90: the idle slot's own KKT bounds η·p ≤ λ ≤ p/η = [50, 50] rule it out.)
    //   00:00, charging at full power into a full battery: one kWh more means charging less at 10, one
    //     less means buying it back at 01:00 for 50: all values in [10, 50], reported at the middle, 30.
    //   02:00, selling at full power down to empty: one kWh more is kept and sold at 60 later, one less
    //     means selling less at 90: [60, 90], middle 75.
    //   03:00–23:00, idle and empty at 60: one kWh more is sold at 60, one less bought at 60: exactly 60.
    const prices = [10, 50, 90, ...Array.from({ length: 21 }, () => 60)];
    const aligned = alignInputs({
      battery: battery(),
      site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
      prices: { startMs: Date.UTC(2026, 2, 2), stepMinutes: 60, values: prices },
    });
    if (!aligned.ok) throw new Error(aligned.issue.message);
    const cycle = steadyOf(aligned.inputs);
    expect(cycle.costPerDay).toBeCloseTo(-80, 9);
    expect(cycle.slots[1]!.storedEnergyValue).toBeCloseTo(50, 9);
    expect(cycle.slots[1]!.storedEnergyValueRange).toEqual({ low: expect.closeTo(50, 9), high: expect.closeTo(50, 9) });
    expect(cycle.slots[0]!.storedEnergyValueRange).toEqual({ low: expect.closeTo(10, 9), high: expect.closeTo(50, 9) });
    expect(cycle.slots[0]!.storedEnergyValue).toBeCloseTo(30, 9);
    expect(cycle.slots[2]!.storedEnergyValueRange).toEqual({ low: expect.closeTo(60, 9), high: expect.closeTo(90, 9) });
    expect(cycle.slots[2]!.storedEnergyValue).toBeCloseTo(75, 9);
    for (const slot of cycle.slots.slice(3)) expect(slot.storedEnergyValue).toBeCloseTo(60, 9);
    // The value at a clock time is that of the slot ending then: 02:00 is the end of the 01:00 slot.
    expect(steadyValueAt(cycle, 120)).toBeCloseTo(50, 9);
  });

  it('make steady-value plans that an independent LP with end energy valued at the checked λ̄ reproduces', () => {
    // [D] A plan with the steady-value rule minimises cost − λ̄(τ_N)·e_N/1000 (DESIGN section 3). Its λ̄(τ_N)
    // is first checked against the KKT bounds of the slot ending at τ_N, then handed to GLPK on the LP of
    // tests/support/reference-lp.ts; both the LP and the dynamic-program paths must match it.
    let checked = 0;
    for (let seed = 1; seed <= 16; seed++) {
      const r = seeded(9300 + seed);
      const day = randomSteadyCase(9300 + seed, { stepMinutes: 60, lossless: seed % 2 === 0 });
      // Three days of the same prices with some noise, so the plan's window differs from the steady day.
      const values = Array.from({ length: 72 }, (_, t) => day.inputs.priceImport[t % 24]! + Math.round(r() * 800 - 400) / 100);
      const aligned = alignInputs({
        battery: day.inputs.battery,
        site: day.inputs.site,
        prices: { startMs: day.inputs.timesMs[0]!, stepMinutes: 60, values },
      });
      if (!aligned.ok) throw new Error(aligned.issue.message);
      const inputs = aligned.inputs;
      const cycle = steadyOf(inputs);
      const from = 24 + Math.floor(r() * 12);
      const hours = 4 + Math.floor(r() * 30);
      const end = from + hours;
      const k = (minuteOfDayAt(inputs, end) / 60 + 23) % 24;
      const { low, high } = kktBounds(cycle, inputs, k);
      const lambda = steadyValueAt(cycle, minuteOfDayAt(inputs, end));
      expect(lambda).toBe(cycle.slots[k]!.storedEnergyValue);
      expect(lambda).toBeGreaterThanOrEqual(low - 1e-6 * (1 + Math.abs(lambda)));
      expect(lambda).toBeLessThanOrEqual(high + 1e-6 * (1 + Math.abs(lambda)));
      const e0 = inputs.battery.energyKwh * 0.5;
      const reference = solveLpWithGlpk(
        referenceLp(problemFor(inputs, from, end, e0, { kind: 'steady-value', valuePerMwh: lambda })),
      );
      expect(reference.status).toBe('optimal');
      for (const method of ['lp', 'dp'] as const) {
        const plan = solvePlan(inputs, {
          startMs: inputs.timesMs[from]!,
          endMs: inputs.timesMs[end]!,
          horizonHours: hours,
          terminal: { kind: 'steady-value' },
          initialSocPct: 50,
          steady: cycle,
          method,
        });
        if (!plan.ok) throw new Error(plan.issue.message);
        expect(plan.plan.terminalRule).toEqual({ kind: 'steady-value', valuePerMwh: lambda });
        expect(plan.plan.solution.objective, `seed ${9300 + seed} ${method}`).toBeCloseTo(reference.objective, 6);
        checked++;
      }
    }
    expect(checked).toBe(32);
  });
});
