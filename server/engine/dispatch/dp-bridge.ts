/**
 * INTEGRATION POINT for the exact dynamic-programming path (issue 9), the only
 * place the LP path refers to it. The DP colleague exports from
 * `server/engine/dp/index.ts`:
 *   canSolveWithDp(problem): { ok: true } | { ok: false; reason: string }
 *   solveDispatchDp(problem): DispatchSolution
 * Until that file exists, every problem reports that the DP path is unavailable
 * and `method: 'auto'` falls back to the LP.
 */
import type { DispatchProblem, DispatchSolution } from '../types';

export type DpCheck = { ok: true } | { ok: false; reason: string };

export function checkDp(problem: DispatchProblem): DpCheck {
  if (problem.freeInitialEnergy) return { ok: false, reason: 'a free initial SoC (steady cycle) is solved by the LP' };
  return { ok: false, reason: 'the exact dynamic-programming path is not installed (server/engine/dp/index.ts)' };
}

export function solveWithDp(problem: DispatchProblem): DispatchSolution | null {
  void problem;
  return null;
}
