/**
 * solveDispatch: one dispatch problem, by the LP or (where exact) the dynamic
 * program. `auto` uses the DP where it says it can solve the problem exactly and
 * the LP everywhere else; the result's `method` says which ran.
 */
import type { DispatchProblem, DispatchSolution } from '../types';
import { checkDp, solveWithDp } from './dp-bridge';
import { validateProblem } from '../model/validate-problem';
import { failedSolution, solveDispatchLp, type LpDispatchOptions } from './solve-dispatch-lp';

export interface DispatchOptions extends LpDispatchOptions {
  /** 'auto' (default): DP where exact, else LP. 'lp' or 'dp' force one path. */
  readonly method?: 'auto' | 'lp' | 'dp';
}

/**
 * Solves one dispatch problem (units: kW, kWh, hours, currency/MWh). Never throws
 * for bad inputs or solver outcomes: look at `status` and `message`.
 */
export function solveDispatch(problem: DispatchProblem, options: DispatchOptions = {}): DispatchSolution {
  const method = options.method ?? 'auto';
  // One validation for both paths, so a bad input reads the same whichever would have solved it.
  const issue = options.validated ? null : validateProblem(problem);
  if (issue) return failedSolution('error', issue.message, method === 'dp' ? 'dp' : 'lp');
  let reason: string | undefined;
  if (method !== 'lp') {
    const check = checkDp(problem);
    if (check.ok) {
      const solution = solveWithDp(problem);
      if (solution) return solution;
      // The DP declined (bad input): the LP path's validation words the message.
    } else if (method === 'dp') {
      return failedSolution('error', `the dynamic-programming path cannot solve this problem: ${check.reason}`, 'dp');
    } else {
      reason = check.reason;
    }
  }
  const solution = solveDispatchLp(problem, { ...options, validated: true }).solution;
  return reason !== undefined && solution.status === 'optimal' ? { ...solution, methodReason: reason } : solution;
}
