import { describe, expect, it } from 'vitest';
import { decisionHorizon, solveDispatchDp } from '../../../server/engine/dp';
import type { DispatchProblem, TerminalRule } from '../../../server/engine/types';
import { solveWithGlpk } from '../../support/reference-lp';
import { seededRandom } from '../../support/seeded-random';
import { windowOf } from '../support/problem-builder';
import { randomProblem, VARIANTS } from '../support/random-problems';

const truncate = (p: DispatchProblem, steps: number): DispatchProblem => windowOf(p, 0, steps);

/**
 * The certificate checked at one lookahead: the DP with that lookahead takes the same first decisions,
 * bit for bit, and ([S] GLPK on the truncated problem) fixing the first SoCs to them costs nothing,
 * i.e. those decisions are optimal at this depth too.
 */
function expectSameFirstDecisions(cut: DispatchProblem, first: number[], label: string) {
  expect(solveDispatchDp(cut).socKwh.slice(1, first.length + 1), label).toEqual(first);
  const free = solveWithGlpk(cut);
  const fixed = solveWithGlpk(cut, { fixSocKwh: first });
  expect(fixed.status, label).toBe('optimal');
  expect(Math.abs(fixed.objective - free.objective), label).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(free.objective)));
}

describe('decision horizon', () => {
  it('certifies first decisions that stay optimal for every lookahead at least that deep', () => {
    let checked = 0;
    let shorter = 0;
    for (let i = 0; i < 40; i++) {
      const seed = 8_000 + i;
      const r = seededRandom(seed);
      const p = randomProblem(VARIANTS[i % VARIANTS.length]!, seed, 30 + Math.floor(r() * 50));
      const n = p.priceImport.length;
      const steps = 1 + Math.floor(r() * 5);
      const dh = decisionHorizon(p, steps);
      if (!dh.ok) continue;
      expect(dh.depthSteps).toBeGreaterThanOrEqual(steps);
      expect(dh.depthSteps).toBeLessThanOrEqual(n);
      expect(dh.depthHours).toBeCloseTo(dh.depthSteps * p.stepHours, 12);
      if (dh.depthSteps < n) shorter++;
      const full = solveDispatchDp(p);
      const first = full.socKwh.slice(1, steps + 1);
      for (const depth of [dh.depthSteps, dh.depthSteps + Math.floor(r() * (n - dh.depthSteps + 1))]) {
        expectSameFirstDecisions(truncate(p, depth), first, `seed ${seed} depth ${depth}`);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(60);
    // Prices far ahead must stop mattering in most instances, else nothing was certified.
    expect(shorter).toBeGreaterThan(20);
  });

  it('under the steady-value rule, certifies decisions for every lookahead priced at its own end time of day', () => {
    // A steady value that changes with the hour at which the plan ends, as the steady
    // cycle's does: a shorter lookahead values its end energy differently, so the
    // certificate must use each truncation's own end value, not the full plan's.
    let checked = 0;
    for (let i = 0; i < 24; i++) {
      const seed = 9_100 + i;
      const r = seededRandom(seed);
      const random = randomProblem('asymmetric powers and efficiencies', seed, 40 + Math.floor(r() * 40));
      // Nearly flat prices: then the end value decides whether energy is bought now and held
      // to the end, so it reaches far back (with wide price swings it hardly matters).
      const prices = random.priceImport.map(() => 70 + (r() - 0.5) * 6);
      const base: DispatchProblem = { ...random, priceImport: prices, priceExport: prices };
      const byHour = Array.from({ length: 24 }, () => 20 + r() * 120);
      const ruleAt = (cut: number): TerminalRule => ({
        kind: 'steady-value',
        valuePerMwh: byHour[Math.round(cut * base.stepHours) % 24]!,
      });
      const n = base.priceImport.length;
      const p: DispatchProblem = { ...base, terminal: ruleAt(n) };
      const steps = 1 + Math.floor(r() * 4);
      const dh = decisionHorizon(p, steps, undefined, ruleAt);
      if (!dh.ok) continue;
      const first = solveDispatchDp(p).socKwh.slice(1, steps + 1);
      for (let depth = dh.depthSteps; depth <= n; depth += 1 + Math.floor(r() * 6)) {
        // Each shorter lookahead with its own end value.
        expectSameFirstDecisions({ ...truncate(p, depth), terminal: ruleAt(depth) }, first, `seed ${seed} depth ${depth}`);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(100);
  });

  it('refuses a number of steps outside the problem', () => {
    const p = randomProblem('negative prices', 3, 10);
    const dh = decisionHorizon(p, 11);
    expect(dh.ok).toBe(false);
    expect(!dh.ok && dh.error).toMatch(/steps must be a whole number from 1 to 10, got 11/);
  });
});
