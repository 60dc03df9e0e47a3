// The stored-energy value (dual of the SoC equation, docs/model.md) checked
// against things outside the engine.
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../server/engine/dispatch/solve-dispatch';
import type { DispatchProblem } from '../../server/engine/types';
import { MODEL_VARIANTS, randomDispatchProblem } from './support/random-problems';

const backends = ['highs', 'glpk'] as const;
const interior = (p: DispatchProblem, e: number) => {
  const { energyKwh: E, socMinPct, socMaxPct } = p.battery;
  return e > (E * socMinPct) / 100 + 1e-6 * E && e < (E * socMaxPct) / 100 - 1e-6 * E;
};

describe.each(backends)('stored-energy value on %s', (backend) => {
  const solve = (p: DispatchProblem) => solveDispatch(p, { method: 'lp', backend });

  it('lies between the one-sided finite-difference derivatives of the optimal cost with respect to e_0', () => {
    // [M] LP sensitivity theory (e.g. Bertsimas & Tsitsiklis, Introduction to Linear Optimization, 1997, ch. 5;
    // from memory): the optimal cost is convex and piecewise linear in a right-hand side, and every optimal
    // dual is a subgradient. e_0 enters only the right side a·e_0 of the first SoC row, so
    // −dz/de_0 = a·λ_0/1000 with λ_0 per MWh and a = 1 − σΔt. At a kink the dual may be anywhere between the
    // one-sided slopes, so we check λ_0 against both, with a step h far below the battery size.
    let checked = 0;
    for (const variant of MODEL_VARIANTS.filter((v) => !v.startsWith('free start'))) {
      for (let seed = 1; seed <= 6; seed++) {
        const p = randomDispatchProblem(variant, 1000 + seed);
        const h = 1e-3 * p.battery.energyKwh;
        if (!interior(p, p.initialEnergyKwh - h) || !interior(p, p.initialEnergyKwh + h) || p.terminal.kind === 'cyclic')
          continue;
        const base = solve(p);
        const up = solve({ ...p, initialEnergyKwh: p.initialEnergyKwh + h });
        const down = solve({ ...p, initialEnergyKwh: p.initialEnergyKwh - h });
        const keep = 1 - (p.battery.selfDischargePctPerHour / 100) * p.stepHours;
        const valueRight = (-(up.objective - base.objective) / h) * 1000;
        const valueLeft = (-(base.objective - down.objective) / h) * 1000;
        const dual = keep * base.storedEnergyValue[0]!;
        const tol = 1e-6 * Math.max(1, Math.abs(dual));
        expect(dual, `${variant} seed ${1000 + seed}`).toBeGreaterThanOrEqual(Math.min(valueLeft, valueRight) - tol);
        expect(dual, `${variant} seed ${1000 + seed}`).toBeLessThanOrEqual(Math.max(valueLeft, valueRight) + tol);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
  });

  it('follows the KKT threshold rule where the battery charges or discharges below full power inside its window', () => {
    // [D] the KKT threshold rule (docs/model.md): at an SoC strictly inside its window, charging below full power
    // implies λ_t = p_t/η_ch and discharging below full power implies λ_t = p_t·η_dis (pure arbitrage, no
    // degradation, no self-discharge: then c_t and d_t have reduced costs p_t·Δt/1000 − η_ch·Δt·λ_t/1000 and
    // −p_t·Δt/1000 + Δt·λ_t/(1000·η_dis), which vanish for a column strictly between its bounds).
    let checked = 0;
    for (let seed = 1; seed <= 40; seed++) {
      const p = randomDispatchProblem('pure arbitrage, free end', 2000 + seed);
      const s = solve(p);
      for (let t = 0; t < p.priceImport.length; t++) {
        if (!interior(p, s.socKwh[t + 1]!)) continue;
        const c = s.chargeKw[t]!;
        const d = s.dischargeKw[t]!;
        const tolKw = 1e-6 * p.battery.powerChargeKw;
        const partialCharge = c > tolKw && c < p.battery.powerChargeKw - tolKw && d < tolKw;
        const partialDischarge = d > tolKw && d < p.battery.powerDischargeKw - tolKw && c < tolKw;
        if (partialCharge) expect(s.storedEnergyValue[t]).toBeCloseTo(p.priceImport[t]! / p.battery.efficiencyCharge, 6);
        if (partialDischarge) expect(s.storedEnergyValue[t]).toBeCloseTo(p.priceImport[t]! * p.battery.efficiencyDischarge, 6);
        if (partialCharge || partialDischarge) checked++;
      }
    }
    expect(checked).toBeGreaterThan(10);
  });
});
