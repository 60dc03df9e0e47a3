/**
 * The single integration point between the LP path and the exact
 * dynamic-programming path (`server/engine/dp/`). `auto` asks
 * canSolveWithDp first and uses the dynamic program only where it is exact.
 * Reserves, a ramp rate and a switching cost are refused here before the DP is
 * asked, since it models none of them; availability alone stays on the DP.
 */
import type { DispatchProblem, DispatchSolution } from '../types';
import { canSolveWithDp, solveDispatchDp } from '../dp';
import { lpOnlyReason } from '../limits/limit-features';
import { limitReadout } from '../limits/read-limits';

export type DpCheck = { ok: true } | { ok: false; reason: string };

export function checkDp(problem: DispatchProblem): DpCheck {
  const limits = lpOnlyReason(problem);
  if (limits !== null) return { ok: false, reason: limits };
  return canSolveWithDp(problem);
}

/** The DP solution, or null when the DP declines (then the LP solves it). */
export function solveWithDp(problem: DispatchProblem): DispatchSolution | null {
  const solution = solveDispatchDp(problem);
  if (solution.status === 'error') return null;
  if (solution.status !== 'optimal' || problem.availability === undefined) return solution;
  return { ...solution, ...limitReadout(problem, solution, undefined, undefined) };
}
