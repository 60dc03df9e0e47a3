// What a plan is worth (DESIGN section 3.1): cash cost, stored energy valued at
// the steady cycle's λ̄, net cost, the site without a battery, battery value.
// Checked against GLPK on the dispatch LP written out independently
// (tests/support/reference-lp.ts).
import { describe, expect, it } from 'vitest';
import { problemFor } from '../../server/engine/inputs/problem-for';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { solveReferencePath } from '../../server/engine/reference/solve-reference-path';
import { solveSteadyCycle, steadyValueAt, type SteadyCycle } from '../../server/engine/steady/solve-steady-cycle';
import { minuteOfDayAt } from '../../server/engine/terminal/terminal-choice';
import type { AlignedInputs } from '../../server/engine/inputs/align-inputs';
import type { TerminalChoice } from '../../server/engine/terminal/terminal-choice';
import { randomDaysInputs } from './support/random-days';
import { xorshiftRandom as seeded } from '../support/seeded-random';
import { referenceLp, solveLpWithGlpk } from '../support/reference-lp';
import { periodicInputs } from './support/periodic-inputs';

function steadyOf(inputs: AlignedInputs): SteadyCycle {
  const result = solveSteadyCycle(inputs);
  if (!result.ok || result.cycle.status !== 'optimal') throw new Error('steady cycle failed');
  return result.cycle;
}

/**
 * [D] netCost = cost − (λ̄_end·e_end − λ̄_start·e_0)/1000. The first two terms are the objective of the
 * dispatch LP over the window with end energy valued at λ̄_end (the steady-value rule), and e_0 is fixed,
 * so the least net cost any schedule of the window can have is that LP's optimum + λ̄_start·e_0/1000.
 */
function leastNetCost(inputs: AlignedInputs, steady: SteadyCycle, from: number, to: number, e0: number): number {
  const endValue = steadyValueAt(steady, minuteOfDayAt(inputs, to));
  const startValue = steadyValueAt(steady, minuteOfDayAt(inputs, from));
  const lp = solveLpWithGlpk(referenceLp(problemFor(inputs, from, to, e0, { kind: 'steady-value', valuePerMwh: endValue })));
  if (lp.status !== 'optimal') throw new Error('reference LP failed');
  return lp.objective + (startValue * e0) / 1000;
}

/** [D] The same window with no battery: the LP with zero charge and discharge power (the SoC just stays put). */
function noBatteryLp(inputs: AlignedInputs, from: number, to: number): number {
  const battery = { ...inputs.battery, powerChargeKw: 0, powerDischargeKw: 0, selfDischargePctPerHour: 0 };
  const e = inputs.battery.energyKwh * (inputs.battery.socMinPct / 100);
  const lp = solveLpWithGlpk(referenceLp({ ...problemFor(inputs, from, to, e, { kind: 'free' }), battery }));
  if (lp.status !== 'optimal') throw new Error('no-battery LP failed');
  return lp.objective;
}

const variants = [
  { stepMinutes: 60, lossless: false },
  { stepMinutes: 60, lossless: true },
  { stepMinutes: 60, lossless: false, site: true },
  { stepMinutes: 15, lossless: false },
] as const;

describe('net figures of plans', () => {
  it.each(variants)('match an independent LP on random instances (%o)', (options) => {
    let checked = 0;
    for (let seed = 1; seed <= (options.stepMinutes === 15 ? 3 : 8); seed++) {
      const inputs = randomDaysInputs(5100 + seed, 3, options);
      const steady = steadyOf(inputs);
      const r = seeded(5100 + seed);
      const perHour = 60 / options.stepMinutes;
      const from = (24 + Math.floor(r() * 12)) * perHour;
      const hours = 4 + Math.floor(r() * 20);
      const to = from + hours * perHour;
      const e0 = (inputs.battery.energyKwh * (inputs.battery.socMinPct + inputs.battery.socMaxPct)) / 200;
      const least = leastNetCost(inputs, steady, from, to, e0);
      const baseline = noBatteryLp(inputs, from, to);
      const rules: [TerminalChoice, number][] = [
        [{ kind: 'steady-value' }, hours],
        [{ kind: 'free' }, hours],
        [{ kind: 'cyclic' }, hours],
        [{ kind: 'steady-value' }, hours + 12],
        [{ kind: 'free' }, hours + 24],
      ];
      for (const [terminal, horizonHours] of rules) {
        const result = solvePlan(inputs, {
          startMs: inputs.timesMs[from]!,
          endMs: inputs.timesMs[to]!,
          horizonHours,
          terminal,
          initialSocPct: (100 * e0) / inputs.battery.energyKwh,
          steady,
        });
        if (!result.ok) throw new Error(result.issue.message);
        const net = result.plan.netFigures;
        const where = `seed ${5100 + seed} ${terminal.kind} ${horizonHours} h`;
        const tol = 1e-6 * (1 + Math.abs(least));
        expect(net.noBatteryCost, where).toBeCloseTo(baseline, 6);
        expect(net.netCost, where).toBeCloseTo(net.cost - net.storedEnergyChange, 9);
        expect(net.batteryValue, where).toBeCloseTo(net.noBatteryCost - net.netCost, 9);
        // No schedule of the window has a lower net cost than the LP with end energy valued at λ̄.
        expect(net.netCost, where).toBeGreaterThanOrEqual(least - tol);
        // A steady-value plan whose horizon is the window is that LP.
        if (terminal.kind === 'steady-value' && horizonHours === hours) expect(net.netCost, where).toBeCloseTo(least, 6);
        checked++;
      }
    }
    expect(checked).toBeGreaterThanOrEqual(15);
  });

  it('value the reference path the same way, and say how', () => {
    const inputs = randomDaysInputs(5301, 3, { stepMinutes: 60, lossless: false });
    const steady = steadyOf(inputs);
    const e0 = (inputs.battery.energyKwh * inputs.battery.socInitialPct) / 100;
    for (const terminal of [{ kind: 'free' }, { kind: 'steady-value' }] as const) {
      const path = solveReferencePath(inputs, { from: 5, to: 60, terminal, steady });
      if (!path.ok || !path.path.netFigures) throw new Error('reference failed');
      const net = path.path.netFigures;
      const least = leastNetCost(inputs, steady, 5, 60, e0);
      if (terminal.kind === 'steady-value') expect(net.netCost).toBeCloseTo(least, 6);
      else expect(net.netCost).toBeGreaterThanOrEqual(least - 1e-6 * (1 + Math.abs(least)));
      const v = net.storedEnergyValuation;
      expect(v).toMatchObject({ valued: true, startClock: '05:00', endClock: '12:00', startEnergyKwh: e0 });
      expect(v.description).toBe(
        `Energy left in the battery valued at the steady cycle's ${v.endValuePerMwh.toFixed(2)} per MWh for 12:00; energy at the start at ${v.startValuePerMwh.toFixed(2)} per MWh for 05:00.`,
      );
    }
  });

  it('names the currency when the site has one, and values nothing when no steady cycle can be had', () => {
    const inputs = periodicInputs(2);
    const withEuro = { ...inputs, site: { ...inputs.site, currency: 'EUR' } };
    const path = solveReferencePath(withEuro, { from: 0, to: 24 });
    if (!path.ok || !path.path.netFigures) throw new Error('reference failed');
    expect(path.path.netFigures.storedEnergyValuation.description).toMatch(
      /^Energy in the battery valued at the steady cycle's -?\d+\.\d\d EUR\/MWh for 00:00, at the start and at the end\.$/,
    );
    // Half a day of data: no representative day, so no steady cycle; cash and net then agree, and it says so.
    const short = { ...inputs, timesMs: inputs.timesMs.slice(0, 12), priceImport: inputs.priceImport.slice(0, 12) };
    const halfDay = solveReferencePath(
      {
        ...short,
        priceExport: short.priceImport,
        loadKw: inputs.loadKw.slice(0, 12),
        generationKw: inputs.generationKw.slice(0, 12),
      },
      { terminal: { kind: 'free' } },
    );
    if (!halfDay.ok || !halfDay.path.netFigures) throw new Error('reference failed');
    const net = halfDay.path.netFigures;
    expect(net.storedEnergyChange).toBe(0);
    expect(net.netCost).toBe(net.cost);
    expect(net.storedEnergyValuation.valued).toBe(false);
    expect(net.storedEnergyValuation.description).toMatch(
      /^Energy left in the battery is not valued: .*whole day.*net cost equals cash cost\.$/,
    );
  });
});
