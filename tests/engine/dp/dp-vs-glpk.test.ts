import { describe, expect, it } from 'vitest';
import { solveDispatchDp } from '../../../server/engine/dp';
import { solveWithGlpk } from '../../support/reference-lp';
import { brokenLimits, recomputedCost } from '../support/limit-check';
import { randomProblem, VARIANTS } from '../support/random-problems';

const INSTANCES = 500;

describe('exact dynamic program against GLPK on random instances', () => {
  for (const variant of VARIANTS) {
    it(`matches GLPK's optimum to 1e-9 relative with a feasible schedule: ${variant}`, () => {
      let compared = 0;
      let infeasible = 0;
      let simultaneous = 0;
      for (let i = 0; i < INSTANCES; i++) {
        const seed = 1000 * (VARIANTS.indexOf(variant) + 1) + i;
        const p = randomProblem(variant, seed);
        const dp = solveDispatchDp(p);
        // [S] GLPK (glpk.js 5.0.0), an independent general-purpose LP solver, on the
        // LP of docs/model.md written out in tests/support/reference-lp.ts.
        const lp = solveWithGlpk(p);
        if (lp.status === 'infeasible') {
          expect(dp.status, `seed ${seed}`).toBe('infeasible');
          expect(dp.message, `seed ${seed}`).toMatch(/step \d+|terminal rule/);
          infeasible++;
          continue;
        }
        expect(lp.status, `seed ${seed}`).toBe('optimal');
        expect(dp.status, `seed ${seed}: ${dp.message}`).toBe('optimal');
        expect(dp.method).toBe('dp');
        const tol = 1e-9 * Math.max(1, Math.abs(lp.objective));
        expect(Math.abs(dp.objective - lp.objective), `seed ${seed}: dp ${dp.objective} lp ${lp.objective}`).toBeLessThanOrEqual(
          tol,
        );
        expect(brokenLimits(p, dp), `seed ${seed}`).toEqual([]);
        // cost is the money of the reported flows, without terminal value [D: docs/model.md, cost].
        expect(Math.abs(dp.cost - recomputedCost(p, dp))).toBeLessThanOrEqual(tol);
        if (dp.chargeKw.some((c, t) => c > 1e-6 && (dp.dischargeKw[t] ?? 0) > 1e-6)) simultaneous++;
        compared++;
      }
      expect(compared + infeasible).toBe(INSTANCES);
      // The variant must mostly produce solvable instances to mean anything.
      expect(compared).toBeGreaterThan(INSTANCES * 0.9);
      // [S: Morales 2025; Prat, Lusby, Pinson 2025] with negative prices the LP optimum
      // may charge and discharge at once; the instances must exercise that case.
      if (variant === 'negative prices') expect(simultaneous).toBeGreaterThan(10);
    });
  }
});
