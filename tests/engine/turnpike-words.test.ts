// Excursions (DESIGN section 2: stretches outside the band between the entry arc
// and the leaving arc) and the plan sentence built from the turnpike figures:
// every clause must agree with the figures it summarises.
import { describe, expect, it } from 'vitest';
import { solvePlan, type Plan } from '../../server/engine/plan/solve-plan';
import { arcFigures, excursionFigures } from '../../server/engine/turnpike/turnpike-figures';
import { planWordsFigures, turnpikeWords } from '../../server/engine/turnpike/turnpike-words';
import { demoInputs } from './support/demo-inputs';
import { periodicInputs } from './support/periodic-inputs';
import { randomDaysInputs } from './support/random-days';
import type { AlignedInputs } from '../../server/engine/inputs/align-inputs';
import type { TerminalChoice } from '../../server/engine/terminal/terminal-choice';

function plan(inputs: AlignedInputs, startMs: number, hours: number, horizonHours: number, terminal: TerminalChoice): Plan {
  const result = solvePlan(inputs, { startMs, endMs: startMs + hours * 3_600_000, horizonHours, terminal });
  if (!result.ok) throw new Error(result.issue.message);
  return result.plan;
}

const words = (p: Plan, rule: string) => turnpikeWords(planWordsFigures(p), 60, rule);

describe('excursions', () => {
  it('are the stretches outside the band between the first and the last step inside it', () => {
    // [D] Distances 0.2 | 0.01 0.3 0.4 0.02 0.5 0.03 | 0.2 with a band of 0.05: the entry arc is step 0, the
    // leaving arc step 7; between them steps 2–3 (at most 0.4) and step 5 (0.5) are outside.
    const fig = arcFigures([0.2, 0.01, 0.3, 0.4, 0.02, 0.5, 0.03, 0.2], new Array<number>(8).fill(0), 1, 0.05);
    expect(fig).toMatchObject({ entryArcSteps: 1, leavingArcSteps: 1, stepsOutsideBand: 5 });
    const ex = excursionFigures(fig);
    expect(ex).toEqual({
      count: 2,
      steps: 3,
      largestDistance: 0.5,
      stretches: [
        { start: 2, steps: 2, largestDistance: 0.4 },
        { start: 5, steps: 1, largestDistance: 0.5 },
      ],
    });
    // Never inside the band: everything is entry arc, nothing is an excursion.
    expect(excursionFigures(arcFigures([0.3, 0.4], [0, 0], 1, 0.05)).count).toBe(0);
  });

  it('account, with the entry and leaving arcs, for every step outside the band of random plans', () => {
    // [D] Steps outside the band are before the first step inside (entry arc), after the last (leaving
    // arc) or between them (excursions): the three add up to the steps outside the band.
    for (let seed = 1; seed <= 12; seed++) {
      const inputs = randomDaysInputs(6400 + seed, 4, { stepMinutes: 60, lossless: seed % 3 === 0 });
      const p = plan(inputs, inputs.timesMs[24 + seed]!, 24, 24 + 4 * seed, { kind: seed % 2 ? 'free' : 'steady-value' });
      const tp = p.turnpike;
      const outside = tp.distance.filter((d) => d > tp.band + 1e-12).length;
      expect(tp.entryArcSteps + tp.leavingArcSteps + tp.excursions.steps, `seed ${6400 + seed}`).toBe(outside);
      const largest = Math.max(0, ...tp.excursions.stretches.flatMap((s) => tp.distance.slice(s.start, s.start + s.steps)));
      expect(tp.excursions.largestDistance).toBe(largest);
    }
  });
});

describe('the plan sentence', () => {
  it('names the excursions of a plan that leaves the band in between and comes back', () => {
    // The demo's free 24 h Sunday plan: it ends at the steady cycle's SoC (no leaving arc) but is far from
    // it twice during the day.
    const p = plan(demoInputs(), Date.parse('2026-12-06T00:00:00+01:00'), 24, 24, { kind: 'free' });
    const ex = p.turnpike.excursions;
    expect(p.turnpike.leavingArcSteps).toBe(0);
    expect(ex.count).toBe(2);
    const sentence = words(p, 'free');
    expect(sentence).toContain(
      `in between it leaves the band twice, for ${ex.steps} h in all, at most ${Math.round(ex.largestDistance * 100)} % of usable energy away`,
    );
    expect(sentence).toContain('it is back near the steady cycle at the end of the horizon');
    expect(sentence).not.toContain('does not leave');
    expect(sentence).toContain(`Stays near the steady cycle ${Math.round(p.turnpike.nearSteadyShare * 100)} % of the time`);
  });

  it('says the plan does not leave the steady cycle only when there is no excursion and no leaving arc', () => {
    // On exactly daily-periodic prices a steady-value plan from the steady SoC stays on the steady cycle.
    const inputs = periodicInputs(12);
    const p = plan(inputs, inputs.timesMs[24]!, 24, 36, { kind: 'steady-value' });
    const tp = p.turnpike;
    const sentence = words(p, 'steady-value');
    expect(tp.excursions.count).toBe(0);
    expect(tp.leavingArcSteps).toBe(0);
    expect(sentence).toContain('it does not leave the steady cycle before the end of the horizon');
    expect(sentence).not.toContain('leaves the band');
    // And across random plans the words follow the figures.
    const seen = { excursions: 0, none: 0, leaving: 0 };
    for (let seed = 1; seed <= 12; seed++) {
      const random = randomDaysInputs(6500 + seed, 4, { stepMinutes: 60, lossless: false });
      const q = plan(random, random.timesMs[30]!, 24, 24 + 6 * seed, { kind: seed % 2 ? 'free' : 'steady-value' });
      const text = words(q, seed % 2 ? 'free' : 'steady-value');
      const f = q.turnpike;
      expect(text.includes('does not leave'), `seed ${6500 + seed}`).toBe(f.excursions.count === 0 && f.leavingArcSteps === 0);
      expect(text.includes('leaves the band'), `seed ${6500 + seed}`).toBe(f.excursions.count > 0);
      expect(text.includes('leave it:'), `seed ${6500 + seed}`).toBe(f.leavingArcSteps > 0);
      if (f.commitWindowSteps !== null) expect(text).toContain(`agree with a plan looking ${q.longerLookaheadHours} h ahead`);
      seen.excursions += f.excursions.count > 0 ? 1 : 0;
      seen.none += f.excursions.count === 0 ? 1 : 0;
      seen.leaving += f.leavingArcSteps > 0 ? 1 : 0;
    }
    expect(seen.excursions).toBeGreaterThan(0);
    expect(seen.none).toBeGreaterThan(0);
    expect(seen.leaving).toBeGreaterThan(0);
  });
});
