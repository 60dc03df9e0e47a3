/**
 * The single integration point between the LP path and the exact
 * dynamic-programming path (`server/engine/dp/`). `auto` asks
 * canSolveWithDp first and uses the dynamic program only where it is exact.
 */
import type { DispatchProblem, DispatchSolution } from '../types';
import { canSolveWithDp, solveDispatchDp } from '../dp';

export type DpCheck = { ok: true } | { ok: false; reason: string };

export function checkDp(problem: DispatchProblem): DpCheck {
  return canSolveWithDp(problem);
}

/** The DP solution, or null when the DP declines (then the LP solves it). */
export function solveWithDp(problem: DispatchProblem): DispatchSolution | null {
  const solution = solveDispatchDp(problem);
  return solution.status === 'error' ? null : solution;
}
