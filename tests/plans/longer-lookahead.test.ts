/**
 * The commit window compares a plan with one of a much longer lookahead, and
 * solvePlan says how long that lookahead was; the plan page's figures take it
 * from there rather than working it out again.
 */
import { describe, expect, it } from 'vitest';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { turnpikeInsight } from '../../server/plans/insights/turnpike-insight';
import { periodicInputs } from '../engine/support/periodic-inputs';

const HOUR_MS = 3_600_000;

function planOver(days: number, startDay: number, horizonHours: number) {
  const inputs = periodicInputs(days);
  const startMs = inputs.timesMs[0]! + startDay * 24 * HOUR_MS;
  const result = solvePlan(inputs, {
    startMs,
    endMs: startMs + 24 * HOUR_MS,
    horizonHours,
    terminal: { kind: 'steady-value' },
    initialSocPct: 25,
    method: 'lp',
  });
  if (!result.ok) throw new Error(result.issue.message);
  return result.plan;
}

describe('the longer lookahead solvePlan used', () => {
  it('is max(4·H, H + 168 h) when the data reach that far', () => {
    // [D] H = 24 h: max(96, 192) = 192 h; 12 days of data from the start leave 288 h, so nothing is cut.
    expect(planOver(12, 0, 24).longerLookaheadHours).toBe(192);
    // [D] H = 60 h: max(240, 228) = 240 h, still inside 288 h.
    expect(planOver(12, 0, 60).longerLookaheadHours).toBe(240);
  });

  it('is cut where the data end, and null when the data end at the horizon', () => {
    // [D] 6 days of data starting at day 1 leave 5 × 24 = 120 h, short of the 192 h asked for.
    expect(planOver(6, 1, 24).longerLookaheadHours).toBe(120);
    // [D] 2 days of data starting at day 1 leave 24 h: exactly the horizon, so no longer plan exists.
    const atTheEnd = planOver(2, 1, 24);
    expect(atTheEnd.longerLookaheadHours).toBeNull();
    expect(atTheEnd.turnpike.commitWindowSteps).toBeNull();
  });

  it('is what the plan page reports beside the commit window', () => {
    const plan = planOver(6, 1, 24);
    expect(plan.turnpike.commitWindowSteps).not.toBeNull();
    const insight = turnpikeInsight(plan, 5, 60, 'steady-value');
    expect(insight.longerLookaheadHours).toBe(120);
    expect(insight.summary).toContain('agree with a plan looking 120 h ahead');
  });
});
