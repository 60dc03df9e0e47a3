// The documented tie-break rule for degenerate optima (server/engine/model/tie-break.ts):
// among optimal schedules, least throughput, then SoC nearest the middle of its window.
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../server/engine/dispatch/solve-dispatch';
import { battery, problem } from './support/problem-builder';

describe.each(['highs', 'glpk'] as const)('tie-break on %s', (backend) => {
  const solve = (p: Parameters<typeof solveDispatch>[0]) => solveDispatch(p, { method: 'lp', backend });

  it('does not trade at flat prices with a cyclic end: zero throughput is optimal and least', () => {
    // [D] With one price p for every step and η ≤ 1, any cycle costs p·(charged − discharged) ≥ 0, so idling
    // is optimal; the rule must pick it among the many schedules that also cost 0 when η = 1.
    const s = solve(problem([50, 50, 50, 50, 50, 50], { battery: battery({ socInitialPct: 30 }), terminal: { kind: 'cyclic' } }));
    expect(s.cost).toBeCloseTo(0, 9);
    expect(Math.max(...s.chargeKw, ...s.dischargeKw)).toBeLessThan(1e-6);
  });

  it('keeps the SoC mid-window in a steady cycle at flat prices', () => {
    // [D] With a free start, cyclic end and flat prices every constant SoC is optimal (docs/model.md: the steady
    // cycle reduces to the optimal steady state); the rule picks the middle of the 10–90 % window.
    const b = battery({ socMinPct: 10, socMaxPct: 90, socInitialPct: 50, efficiencyCharge: 0.9, efficiencyDischarge: 0.9 });
    const s = solve({ ...problem([50, 50, 50, 50], { battery: b, terminal: { kind: 'cyclic' } }), freeInitialEnergy: true });
    expect(s.tieBroken).toBe(true);
    for (const e of s.socKwh) expect(e).toBeCloseTo(500, 6);
  });

  it('reports simultaneous charge and discharge when negative prices make it pay', () => {
    // [S] Morales 2025 / Prat, Lusby & Pinson 2025 (docs/sources.md): the LP relaxation charges and discharges
    // at once when prices are negative. [D] At −100 /MWh with η = 0.8 each, a full battery earns by running
    // both at full power: the grid pays for 1 MW in, and discharging 1 MW returns only 0.8·0.8 of it stored.
    const b = battery({ efficiencyCharge: 0.8, efficiencyDischarge: 0.8, socInitialPct: 100 });
    const s = solve(problem([-100, -100], { battery: b }));
    expect(s.simultaneousSteps).toEqual([0, 1]);
  });
});
