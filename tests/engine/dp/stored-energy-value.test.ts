import { describe, expect, it } from 'vitest';
import { solveDispatchDp, valueCurves } from '../../../server/engine/dp';
import type { DispatchProblem } from '../../../server/engine/types';
import { solveWithGlpk, type LpTweaks } from '../../support/reference-lp';
import { seededRandom } from '../../support/seeded-random';
import { randomProblem, VARIANTS } from '../support/random-problems';

/**
 * The interval of stored-energy values (currency/MWh) that optimal LP duals of
 * the SoC equation of step t take, from GLPK by finite differences:
 * [D, LP sensitivity] the optimal cost C(δ) with δ kWh injected into that
 * equation is convex in δ, and the set of optimal duals is [C′₊(0), C′₋(0)]
 * with the value sign flipped (value = −dC/dδ·1000). The secants over ±δ
 * enclose that interval (convexity), so "inside the secants" can only be
 * looser than the exact test, never wrongly strict. Returns null when a
 * perturbed LP is infeasible (e.g. a cyclic end at a bound).
 */
function lpValueInterval(
  p: DispatchProblem,
  tweak: (delta: number) => LpTweaks,
  delta: number,
): { low: number; high: number } | null {
  const c0 = solveWithGlpk(p, tweak(0));
  const up = solveWithGlpk(p, tweak(delta));
  const down = solveWithGlpk(p, tweak(-delta));
  if (c0.status !== 'optimal' || up.status !== 'optimal' || down.status !== 'optimal') return null;
  return { low: (-(up.objective - c0.objective) / delta) * 1000, high: (-(c0.objective - down.objective) / delta) * 1000 };
}

describe('stored-energy value of the dynamic program', () => {
  it('lies within the LP dual interval wherever the SoC is strictly inside its window', () => {
    let checked = 0;
    for (let i = 0; i < 400; i++) {
      const variant = VARIANTS[i % VARIANTS.length]!;
      const seed = 77_000 + i;
      const p = randomProblem(variant, seed);
      const dp = solveDispatchDp(p, { intervals: true });
      if (dp.status !== 'optimal') continue;
      const b = p.battery;
      const emin = (b.energyKwh * b.socMinPct) / 100;
      const emax = (b.energyKwh * b.socMaxPct) / 100;
      const margin = 1e-3 * b.energyKwh;
      const delta = 1e-5 * b.energyKwh;
      const r = seededRandom(seed);
      for (let k = 0; k < 2; k++) {
        const t = Math.floor(r() * p.priceImport.length);
        const e = dp.socKwh[t + 1]!;
        // [S: docs/sources.md, degeneracy] duals are not unique at bounds: compare inside only.
        if (!(e > emin + margin && e < emax - margin)) continue;
        const lp = lpValueInterval(p, (d) => ({ inject: { step: t, deltaKwh: d } }), delta);
        if (!lp) continue;
        const value = dp.storedEnergyValue[t]!;
        const tol = 1e-6 * (1 + Math.abs(value));
        expect(value, `seed ${seed} step ${t}`).toBeGreaterThanOrEqual(lp.low - tol);
        expect(value, `seed ${seed} step ${t}`).toBeLessThanOrEqual(lp.high + tol);
        // The reported value is a slope of V_{t+1} at the chosen energy.
        expect(value).toBeGreaterThanOrEqual(dp.storedEnergyValueRange!.low[t]! - tol);
        expect(value).toBeLessThanOrEqual(dp.storedEnergyValueRange!.high[t]! + tol);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(300);
  });

  it('gives value curves equal to the derivative of the optimal cost with respect to the initial energy', () => {
    let checked = 0;
    for (let i = 0; i < 150; i++) {
      const variant = VARIANTS[i % VARIANTS.length]!;
      const seed = 91_000 + i;
      const base = randomProblem(variant, seed);
      const b = base.battery;
      const emin = (b.energyKwh * b.socMinPct) / 100;
      const emax = (b.energyKwh * b.socMaxPct) / 100;
      const r = seededRandom(seed);
      const e0 = emin + (0.05 + 0.9 * r()) * (emax - emin);
      const p = { ...base, initialEnergyKwh: e0 };
      const curves = valueCurves(p, null, [p.timesMs[0]!]);
      if (!curves.ok) continue;
      const pts = curves.curves[0]!.points;
      const pct = (e0 / b.energyKwh) * 100;
      // The staircase value at e0, skipping SoCs within 1e-3 % of a step (kinks).
      const at = pts.findIndex((q, j) => j % 2 === 0 && q.socPct < pct - 1e-3 && pts[j + 1]!.socPct > pct + 1e-3);
      if (at < 0) continue;
      // [D, LP sensitivity] dC/de0: the value of energy held at the start, by finite differences in GLPK.
      const delta = 1e-6 * b.energyKwh;
      const lp = lpValueInterval(p, (d) => ({ initialEnergyKwh: e0 + d }), delta);
      if (!lp) continue;
      const value = pts[at]!.value;
      const tol = 1e-5 * (1 + Math.abs(value));
      expect(value, `seed ${seed}`).toBeGreaterThanOrEqual(lp.low - tol);
      expect(value, `seed ${seed}`).toBeLessThanOrEqual(lp.high + tol);
      // Value curves fall with SoC (convex cost-to-go).
      for (let j = 1; j < pts.length; j++) expect(pts[j]!.value).toBeLessThanOrEqual(pts[j - 1]!.value + 1e-9);
      checked++;
    }
    expect(checked).toBeGreaterThan(100);
  });
});
