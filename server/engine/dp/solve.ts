import type { DispatchProblem, DispatchSolution, SolveStatus } from '../types';
import { canSolveWithDp, checkDpInput } from './can-solve';
import { makeContext, terminalValue } from './context';
import { PlanSeries } from './plan-series';
import type { StageTable } from './stage-cost';
import { DpValueFunctions } from './value-functions';
import { WindowSolver } from './window-solver';

export interface DpSolveOptions {
  /** Keep every V_t for value curves and the decision horizon (memory: steps × segments). */
  readonly keepValueFunctions?: boolean;
  /** Also report the slope interval of V_{t+1} at each chosen e_{t+1} (kinks give an interval). */
  readonly intervals?: boolean;
  /** A stage table built earlier for the same problem data (saves rebuilding it). */
  readonly stages?: StageTable;
}

/** A DispatchSolution from the dynamic program, with its optional extras. */
export interface DpSolution extends DispatchSolution {
  readonly method: 'dp';
  /**
   * When `intervals` is set: ends of −∂V_{t+1}(e_{t+1})·1000 (currency/MWh), the
   * stored-energy values consistent with the future at the chosen energy; they
   * differ at kinks and are ∓Infinity where e_{t+1} sits at a bound of its window.
   */
  readonly storedEnergyValueRange?: { readonly low: readonly number[]; readonly high: readonly number[] };
  readonly valueFunctions?: DpValueFunctions;
}

export function emptyDpSolution(status: SolveStatus, message: string): DpSolution {
  return {
    status,
    method: 'dp',
    message,
    objective: NaN,
    cost: NaN,
    chargeKw: [],
    dischargeKw: [],
    gridImportKw: [],
    gridExportKw: [],
    socKwh: [],
    storedEnergyValue: [],
    peakImportKw: NaN,
  };
}

/**
 * Solves the dispatch problem exactly by dynamic programming on convex
 * piecewise-linear value functions (docs/model.md). Same series and
 * meanings as the LP: cost includes degradation and excludes the terminal
 * value; storedEnergyValue[t] is the value (currency/MWh) of one more MWh at
 * the end of step t, chosen inside the set of optimal LP duals. Models it
 * cannot take return status 'error' with the reason; infeasible ones return
 * 'infeasible' with a message naming the first offending step.
 */
export function solveDispatchDp(problem: DispatchProblem, options: DpSolveOptions = {}): DpSolution {
  const bad = checkDpInput(problem);
  if (bad !== null) return emptyDpSolution('error', bad);
  const eligible = canSolveWithDp(problem);
  if (!eligible.ok) return emptyDpSolution('error', `the dynamic program cannot solve this model: ${eligible.reason}`);
  const ctx = makeContext(problem, options.stages);
  const n = problem.priceImport.length;
  const solver = new WindowSolver(ctx, n);
  const failure = solver.solveWindow(0, n, problem.initialEnergyKwh, problem.terminal, n, false);
  if (failure !== null) return emptyDpSolution('infeasible', failure);
  const series = new PlanSeries(n);
  series.copyFrom(solver, 0, n, 0);
  const sol = series.toSolution(problem, 0, problem.initialEnergyKwh, options.intervals === true);
  const endE = sol.socKwh[n] ?? 0;
  return {
    ...sol,
    objective: sol.cost - terminalValue(problem.terminal, endE),
    ...(options.keepValueFunctions === true ? { valueFunctions: new DpValueFunctions(ctx, solver, 0, n) } : {}),
  };
}
