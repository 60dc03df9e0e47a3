// The stored-energy value (dual of the SoC equation) with reserves and the other
// operating limits on, against finite differences of the optimal objective.
//
// [M] LP sensitivity theory (e.g. Bertsimas & Tsitsiklis, Introduction to Linear
// Optimization, 1997, ch. 5; from memory): the optimal objective z is convex and
// piecewise linear in a right-hand side and every optimal dual is a subgradient.
// [D] With reserves, e_0 enters the right side a·e_0 of the first SoC row and the
// two energy-headroom rows at the start of step 0 (e_0 − r↑_0·D/η_dis ≥ E_min,
// e_0 + r↓_0·D·η_ch ≤ E_max). Where both headroom rows are slack in the schedule
// found, complementary slackness makes their duals zero in every optimal dual, so
// −dz/de_0 = a·λ_0/1000 (a = 1 − σΔt): a·λ_0 lies between the one-sided
// finite-difference values and equals them where the two agree.
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../../server/engine/dispatch/solve-dispatch';
import type { DispatchProblem, DispatchSolution } from '../../../server/engine/types';
import { randomLimitProblem } from './random-limits';

const interior = (p: DispatchProblem, e: number) => {
  const { energyKwh: E, socMinPct, socMaxPct } = p.battery;
  return e > (E * socMinPct) / 100 + 1e-6 * E && e < (E * socMaxPct) / 100 - 1e-6 * E;
};

/** Whether both energy-headroom rows at the start of step 0 are slack by more than `margin` kWh. */
function startHeadroomSlack(p: DispatchProblem, s: DispatchSolution, margin: number): boolean {
  const b = p.battery;
  const D = p.reserveHours ?? 0;
  const e0 = p.initialEnergyKwh;
  const low = e0 - ((s.reserveUpKw?.[0] ?? 0) * D) / b.efficiencyDischarge - (b.energyKwh * b.socMinPct) / 100;
  const high = (b.energyKwh * b.socMaxPct) / 100 - e0 - (s.reserveDownKw?.[0] ?? 0) * D * b.efficiencyCharge;
  return low > margin && high > margin;
}

describe.each(['highs', 'glpk'] as const)('stored-energy value with reserves on (%s)', (backend) => {
  it('lies between the one-sided derivatives of the optimal objective with respect to e_0, and equals them where they agree', () => {
    let checked = 0;
    let smooth = 0;
    for (const feature of ['reserves', 'all combined'] as const) {
      for (let seed = 1; seed <= 60; seed++) {
        const p = randomLimitProblem(feature, 500 + seed);
        const h = 1e-4 * p.battery.energyKwh;
        if (p.terminal.kind === 'cyclic' || !interior(p, p.initialEnergyKwh - h) || !interior(p, p.initialEnergyKwh + h))
          continue;
        const solve = (q: DispatchProblem) => solveDispatch(q, { method: 'lp', backend });
        const base = solve(p);
        expect(base.status).toBe('optimal');
        if (!startHeadroomSlack(p, base, 10 * h)) continue;
        const up = solve({ ...p, initialEnergyKwh: p.initialEnergyKwh + h });
        const down = solve({ ...p, initialEnergyKwh: p.initialEnergyKwh - h });
        const keep = 1 - (p.battery.selfDischargePctPerHour / 100) * p.stepHours;
        const right = (-(up.objective - base.objective) / h) * 1000;
        const left = (-(base.objective - down.objective) / h) * 1000;
        const dual = keep * base.storedEnergyValue[0]!;
        const tol = 1e-5 * Math.max(1, Math.abs(dual), Math.abs(left), Math.abs(right));
        const where = `${feature} seed ${500 + seed}: left ${left}, dual ${dual}, right ${right}`;
        expect(dual, where).toBeGreaterThanOrEqual(Math.min(left, right) - tol);
        expect(dual, where).toBeLessThanOrEqual(Math.max(left, right) + tol);
        if (Math.abs(left - right) <= tol) {
          expect(Math.abs(dual - right), where).toBeLessThanOrEqual(tol);
          smooth++;
        }
        if ((base.reserveRevenue ?? 0) > 0) checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
    expect(smooth).toBeGreaterThan(10);
  });
});
