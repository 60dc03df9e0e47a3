// The engine's LP path against two independent LP solvers from the npm registry
// (javascript-lp-solver 1.0.3 and glpk.js 5.0.0) on a second, independently
// written formulation of docs/model.md (tests/support/reference-lp.ts):
// optimal costs must agree within 1e-6 relative on 50 seeded random instances of
// every model variant, for both of the engine's backends, and no schedule may
// break a limit. [D] An LP has one optimal value even when several schedules reach it
// (so every correct solver must report the same cost).
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../server/engine/dispatch/solve-dispatch';
import { referenceLp, solveLpWithGlpk, solveLpWithJsLpSolver } from '../support/reference-lp';
import { MODEL_VARIANTS, randomDispatchProblem } from './support/random-problems';
import { brokenLimits } from './support/limit-check';

const INSTANCES = 50;
const close = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b));

describe.each(MODEL_VARIANTS)('variant: %s', (variant) => {
  it(`reaches the same optimal cost as javascript-lp-solver and glpk.js on ${INSTANCES} seeded instances, with every limit kept`, () => {
    for (let seed = 1; seed <= INSTANCES; seed++) {
      const problem = randomDispatchProblem(variant, seed);
      const lp = referenceLp(problem);
      const jsLp = solveLpWithJsLpSolver(lp);
      const direct = solveLpWithGlpk(lp, { presolve: true });
      expect(direct.status, `glpk.js, seed ${seed}`).toBe('optimal');
      expect(jsLp.status, `javascript-lp-solver, seed ${seed}`).toBe('optimal');
      for (const backend of ['highs', 'glpk'] as const) {
        const solution = solveDispatch(problem, { method: 'lp', backend });
        const where = `${backend}, seed ${seed}: engine ${solution.objective}, glpk.js ${direct.objective}, js-lp ${jsLp.objective}`;
        expect(solution.status, where).toBe('optimal');
        expect(close(solution.objective, direct.objective), where).toBe(true);
        expect(close(solution.objective, jsLp.objective), where).toBe(true);
        expect(brokenLimits(problem, solution), where).toEqual([]);
      }
    }
  });
});
