// The operating limits of DESIGN section 3.3 (reserves, availability, ramp rate,
// switching cost) against an LP built here from the design's equations
// (reference-limits-lp.ts, on the independent section-3 LP of
// tests/support/reference-lp.ts) and solved by glpk.js 5.0.0 and
// javascript-lp-solver 1.0.3. [D] An LP has one optimal value even when several
// schedules reach it, so every correct formulation and solver must report the
// same objective (cost + switching penalty − terminal value), within 1e-6 relative.
// Every schedule must also keep every limit (limit-check-limits.ts and the
// section-3 checks of tests/engine/support/limit-check.ts).
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../../server/engine/dispatch/solve-dispatch';
import { solveLpWithGlpk, solveLpWithJsLpSolver } from '../../support/reference-lp';
import { brokenLimits } from '../support/limit-check';
import { referenceLimitsLp } from './reference-limits-lp';
import { LIMIT_FEATURES, randomLimitProblem } from './random-limits';
import { brokenOperatingLimits } from './limit-check-limits';

const INSTANCES = 30;
const close = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b));

describe.each(LIMIT_FEATURES)('operating limits: %s', (feature) => {
  it(`reaches the optimal objective of an independent LP on ${INSTANCES} seeded instances, both backends, every limit kept`, () => {
    for (let seed = 1; seed <= INSTANCES; seed++) {
      const problem = randomLimitProblem(feature, seed);
      const lp = referenceLimitsLp(problem);
      const direct = solveLpWithGlpk(lp);
      const jsLp = solveLpWithJsLpSolver(lp);
      expect(direct.status, `glpk.js, seed ${seed}`).toBe('optimal');
      expect(jsLp.status, `javascript-lp-solver, seed ${seed}`).toBe('optimal');
      for (const backend of ['highs', 'glpk'] as const) {
        const solution = solveDispatch(problem, { backend });
        const where = `${backend}, seed ${seed}: engine ${solution.objective}, glpk.js ${direct.objective}, js-lp ${jsLp.objective}`;
        expect(solution.status, `${where} ${solution.message ?? ''}`).toBe('optimal');
        expect(close(solution.objective, direct.objective), where).toBe(true);
        expect(close(solution.objective, jsLp.objective), where).toBe(true);
        expect(brokenLimits(problem, solution), where).toEqual([]);
        expect(brokenOperatingLimits(problem, solution), where).toEqual([]);
      }
    }
  });
});

describe('which path solves a model with operating limits', () => {
  it('keeps availability alone on the exact DP, equal to the LP and to the independent LP', () => {
    let dp = 0;
    for (let seed = 1; seed <= INSTANCES; seed++) {
      const problem = randomLimitProblem('availability', seed);
      const auto = solveDispatch(problem);
      const lp = solveDispatch(problem, { method: 'lp' });
      const direct = solveLpWithGlpk(referenceLimitsLp(problem));
      // The demand-charge and throughput-cap bases go to the LP for their own reasons.
      if (problem.site.demandChargePerKw === null && problem.battery.maxCyclesPerDay === null) {
        expect(auto.method, `seed ${seed}`).toBe('dp');
        dp++;
      }
      expect(close(auto.objective, lp.objective), `seed ${seed}`).toBe(true);
      expect(close(auto.objective, direct.objective), `seed ${seed}`).toBe(true);
      expect(brokenOperatingLimits(problem, auto), `seed ${seed}`).toEqual([]);
    }
    expect(dp).toBeGreaterThan(15);
  });

  it('sends reserves, a ramp rate and a switching cost to the LP and says why', () => {
    for (const feature of ['reserves', 'ramp rate', 'switching cost'] as const) {
      const problem = randomLimitProblem(feature, 3);
      const solution = solveDispatch(problem);
      expect(solution.method).toBe('lp');
      expect(solution.methodReason).toMatch(
        feature === 'reserves' ? /reserves are held/ : feature === 'ramp rate' ? /ramp rate/ : /switching cost/,
      );
      const forced = solveDispatch(problem, { method: 'dp' });
      expect(forced.status).toBe('error');
      expect(forced.message).toMatch(/LP path solves it/);
    }
  });
});
