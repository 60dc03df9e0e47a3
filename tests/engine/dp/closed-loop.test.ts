import { describe, expect, it } from 'vitest';
import { createDpClosedLoop, type DpWindowPlan } from '../../../server/engine/dp';
import type { DispatchProblem, TerminalRule } from '../../../server/engine/types';
import { solveWithGlpk } from '../../support/reference-lp';
import { seededRandom } from '../../support/seeded-random';
import { windowOf } from '../support/problem-builder';
import { randomProblem, VARIANTS } from '../support/random-problems';

interface Snapshot {
  start: number;
  soc: number[];
  value: number[];
  charge: number[];
}

function windowRules(seed: number): (s: number, end: number) => TerminalRule {
  const r = seededRandom(seed);
  const kind = Math.floor(r() * 4);
  const base = 20 + 80 * r();
  return (_s, end) => {
    if (kind === 0) return { kind: 'free' };
    if (kind === 1) return { kind: 'cyclic' };
    if (kind === 2) return { kind: 'target', socPct: 40 };
    // A steady value that depends on the window's end, as a time-of-day value would.
    return { kind: 'steady-value', valuePerMwh: base + 10 * Math.sin(end / 3) };
  };
}

function windowProblem(p: DispatchProblem, plan: DpWindowPlan, e0: number): DispatchProblem {
  return windowOf(p, plan.startStep, plan.endStep, { initialEnergyKwh: e0, terminal: plan.terminal });
}

describe('closed-loop receding-horizon runs on the dynamic program', () => {
  it('give bit-identical schedules, plans and values with warm reuse and cold solves', () => {
    let reused = 0;
    for (let i = 0; i < 60; i++) {
      const seed = 5_000 + i;
      const r = seededRandom(seed);
      const p = randomProblem(VARIANTS[i % VARIANTS.length]!, seed, 40 + Math.floor(r() * 160));
      const horizonSteps = 2 + Math.floor(r() * 47);
      const replanSteps = 1 + Math.floor(r() * Math.min(horizonSteps, 6));
      const loop = createDpClosedLoop(p);
      const runs = [true, false].map((warm) => {
        const plans: Snapshot[] = [];
        const res = loop.run({
          horizonSteps,
          replanSteps,
          warm,
          intervals: true,
          terminalForWindow: windowRules(seed),
          onPlan: (pl) =>
            plans.push({
              start: pl.startStep,
              soc: Array.from(pl.socKwh),
              value: Array.from(pl.storedEnergyValue),
              charge: Array.from(pl.chargeKw),
            }),
        });
        return { res, plans };
      });
      const [warm, cold] = runs as [(typeof runs)[0], (typeof runs)[0]];
      expect(warm.res.solution.status).toBe(cold.res.solution.status);
      // Object.is compares bits (it tells 0 from -0), the contract of warm reuse.
      const same = (a: readonly number[], b: readonly number[]): boolean =>
        a.length === b.length && a.every((v, k) => Object.is(v, b[k]));
      for (const key of ['chargeKw', 'dischargeKw', 'gridImportKw', 'gridExportKw', 'socKwh', 'storedEnergyValue'] as const) {
        expect(same(warm.res.solution[key], cold.res.solution[key]), `seed ${seed} ${key}`).toBe(true);
      }
      expect(warm.plans.length).toBe(cold.plans.length);
      warm.plans.forEach((pl, k) => {
        const other = cold.plans[k]!;
        expect(
          same(pl.soc, other.soc) && same(pl.value, other.value) && same(pl.charge, other.charge),
          `seed ${seed} window ${pl.start}`,
        ).toBe(true);
      });
      reused += warm.res.stats.backwardStepsReused + warm.res.stats.forwardStepsReused;
      expect(cold.res.stats.backwardStepsReused).toBe(0);
    }
    // Reuse must actually happen, or the comparison above proves nothing.
    expect(reused).toBeGreaterThan(1000);
  });

  it('plans every window optimally, as GLPK does for the same window', () => {
    let windows = 0;
    for (let i = 0; i < 14; i++) {
      const seed = 6_000 + i;
      const r = seededRandom(seed);
      const p = randomProblem(VARIANTS[i % VARIANTS.length]!, seed, 30 + Math.floor(r() * 30));
      const horizonSteps = 4 + Math.floor(r() * 20);
      const plans: { problem: DispatchProblem; soc: number[] }[] = [];
      const res = createDpClosedLoop(p).run({
        horizonSteps,
        replanSteps: 1 + Math.floor(r() * 3),
        terminalForWindow: windowRules(seed),
        onPlan: (pl) => plans.push({ problem: windowProblem(p, pl, pl.socKwh[0]!), soc: Array.from(pl.socKwh) }),
      });
      if (res.solution.status !== 'optimal') continue;
      for (const { problem, soc } of plans) {
        // [S] GLPK, an independent LP solver, on the same window; the DP plan's own
        // objective is recomputed from its SoC path via a DP solve of that window.
        const lp = solveWithGlpk(problem);
        expect(lp.status).toBe('optimal');
        const dpWindow = createDpClosedLoop(problem).run({
          horizonSteps: problem.priceImport.length,
          replanSteps: problem.priceImport.length,
        });
        expect(Array.from(dpWindow.solution.socKwh)).toEqual(soc);
        expect(Math.abs(dpWindow.solution.objective - lp.objective)).toBeLessThanOrEqual(
          1e-9 * Math.max(1, Math.abs(lp.objective)),
        );
        windows++;
      }
    }
    expect(windows).toBeGreaterThan(300);
  });

  it('refuses a replanning interval longer than the horizon, saying why', () => {
    const p = randomProblem('negative prices', 1, 10);
    const res = createDpClosedLoop(p).run({ horizonSteps: 3, replanSteps: 4 });
    expect(res.solution.status).toBe('error');
    expect(res.solution.message).toMatch(/replanSteps must be .* from 1 to the horizon \(3 steps\), got 4/);
  });
});
