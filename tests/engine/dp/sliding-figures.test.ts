// Turnpike figures of closed-loop plans, updated only where consecutive plans
// differ, against a full recount of every plan.
import { describe, expect, it } from 'vitest';
import { createDpClosedLoop, solveDispatchDp } from '../../../server/engine/dp';
import { arcFigures } from '../../../server/engine/turnpike/turnpike-figures';
import { SlidingArcFigures } from '../../../server/engine/turnpike/sliding-arc-figures';
import type { TerminalRule } from '../../../server/engine/types';
import { seededRandom } from '../../support/seeded-random';
import { randomProblem, VARIANTS } from '../support/random-problems';

const RULES: readonly TerminalRule[] = [
  { kind: 'free' },
  { kind: 'cyclic' },
  { kind: 'target', socPct: 40 },
  { kind: 'steady-value', valuePerMwh: 55 },
];

describe('closed-loop plans on the dynamic program', () => {
  it('list every step whose entries changed since the previous plan, and reuse the rest', () => {
    let listed = 0;
    let steps = 0;
    const wrong: string[] = [];
    for (let i = 0; i < 40; i++) {
      const seed = 7_000 + i;
      const r = seededRandom(seed);
      const p = randomProblem(VARIANTS[i % VARIANTS.length]!, seed, 60 + Math.floor(r() * 140));
      const horizonSteps = 2 + Math.floor(r() * 40);
      const replanSteps = 1 + Math.floor(r() * Math.min(horizonSteps, 4));
      let previous: { start: number; end: number; soc: number[]; charge: number[] } | null = null;
      createDpClosedLoop({ ...p, terminal: RULES[i % RULES.length]! }).run({
        horizonSteps,
        replanSteps,
        onPlan: (plan) => {
          const changed = new Set(plan.recomputedSteps);
          for (let t = plan.startStep; t < plan.endStep; t++) {
            const k = t - plan.startStep;
            if (changed.has(t)) continue;
            // [D] An unlisted step must have been in the previous plan with the same entries (Object.is: same bits).
            const kept =
              previous !== null &&
              t < previous.end &&
              Object.is(plan.socKwh[k + 1], previous.soc[t - previous.start + 1]) &&
              Object.is(plan.chargeKw[k], previous.charge[t - previous.start]);
            if (!kept) wrong.push(`seed ${seed}: step ${t} of the window from ${plan.startStep}`);
          }
          listed += changed.size;
          steps += plan.endStep - plan.startStep;
          previous = {
            start: plan.startStep,
            end: plan.endStep,
            soc: Array.from(plan.socKwh),
            charge: Array.from(plan.chargeKw),
          };
        },
      });
    }
    expect(wrong.slice(0, 5)).toEqual([]);
    // Most steps must come unchanged from the previous plan, or the check above proves little.
    expect(listed).toBeLessThan(steps / 2);
  });

  it('give the same near-steady share and leaving arc per plan as a full recount', () => {
    let windows = 0;
    let withLeavingArc = 0;
    for (let i = 0; i < 40; i++) {
      const seed = 8_000 + i;
      const r = seededRandom(seed);
      const p = randomProblem(VARIANTS[i % VARIANTS.length]!, seed, 60 + Math.floor(r() * 140));
      const usable = (p.battery.energyKwh * (p.battery.socMaxPct - p.battery.socMinPct)) / 100;
      // Reference: the whole-period optimum, with a few unknown (NaN) entries.
      const whole = solveDispatchDp(p);
      if (whole.status !== 'optimal') continue;
      const reference = whole.socKwh.slice(1).map((e, t) => (t % 17 === 5 ? NaN : e));
      const band = 0.01 + 0.2 * r();
      const sliding = new SlidingArcFigures(reference, usable, band);
      createDpClosedLoop(p).run({
        horizonSteps: 2 + Math.floor(r() * 40),
        replanSteps: 1 + Math.floor(r() * 2),
        onPlan: (plan) => {
          // [D] arcFigures (docs/model.md) recounts the whole plan from scratch.
          const full = arcFigures(plan.socKwh.subarray(1), reference.slice(plan.startStep, plan.endStep), usable, band);
          const fig = sliding.update(plan.startStep, plan.endStep, plan.socKwh.subarray(1), plan.recomputedSteps);
          expect(fig.nearSteadyShare, `seed ${seed} window ${plan.startStep}`).toBe(full.nearSteadyShare);
          expect(fig.leavingArcSteps, `seed ${seed} window ${plan.startStep}`).toBe(full.leavingArcSteps);
          windows++;
          if (full.leavingArcSteps > 0) withLeavingArc++;
        },
      });
    }
    expect(windows).toBeGreaterThan(2000);
    // Both outcomes must occur for the comparison to mean something.
    expect(withLeavingArc).toBeGreaterThan(100);
    expect(withLeavingArc).toBeLessThan(windows);
  });

  it('recount in full when a window does not follow the previous one', () => {
    const reference = [0, 10, 20, 30, 40, 50];
    const sliding = new SlidingArcFigures(reference, 100, 0.05);
    // [D] By hand: plan [0, 10, 20, 99] against [0, 10, 20, 30] is inside for 3 of 4 steps, leaving arc 1.
    expect({ ...sliding.update(0, 4, [0, 10, 20, 99], [0, 1, 2, 3]) }).toEqual({ nearSteadyShare: 0.75, leavingArcSteps: 1 });
    // Sliding on: steps 2 and 3 unchanged (listed nothing), steps 4 and 5 new, both inside.
    expect({ ...sliding.update(2, 6, [20, 99, 40, 50], [4, 5]) }).toEqual({ nearSteadyShare: 0.75, leavingArcSteps: 0 });
    // A window that starts earlier again is counted afresh: [80, 80] against [10, 20] never comes inside.
    expect({ ...sliding.update(1, 3, [80, 80], []) }).toEqual({ nearSteadyShare: 0, leavingArcSteps: 0 });
  });
});
