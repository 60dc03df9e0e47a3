import type { DispatchProblem, TerminalRule } from '../types';
import { canSolveWithDp, checkDpInput } from './can-solve';
import { makeContext, terminalValue, type DpContext } from './context';
import { PlanSeries } from './plan-series';
import { emptyDpSolution, type DpSolution } from './solve';
import { buildStageTable, type StageTable } from './stage-cost';
import { WindowSolver, type DpWorkStats } from './window-solver';

/** Options of a receding-horizon (closed-loop) run over the whole problem. */
export interface DpClosedLoopOptions {
  /** Lookahead of each window in steps (the window never reads past the end of the problem). */
  readonly horizonSteps: number;
  /** Steps applied from each window before re-planning (1 = re-plan every step); at most horizonSteps. */
  readonly replanSteps: number;
  /**
   * Terminal rule of the window [startStep, endStep). Default: the problem's
   * rule (`cyclic` then means back to the energy at the window's start).
   */
  readonly terminalForWindow?: (startStep: number, endStep: number) => TerminalRule;
  /** Reuse value functions and decisions of the previous window (default true); results are bit-identical either way. */
  readonly warm?: boolean;
  /**
   * Called with each window's open-loop plan (e.g. for turnpike figures).
   * The arrays are scratch buffers, valid only during the call. Asking for
   * plans makes every window run its forward pass to the end.
   */
  readonly onPlan?: (plan: DpWindowPlan) => void;
  /** Add storedEnergyValueRange to the realized solution. */
  readonly intervals?: boolean;
}

/** One window's open-loop plan: steps [startStep, endStep), socKwh has one more entry (starting energy first). */
export interface DpWindowPlan {
  readonly startStep: number;
  readonly endStep: number;
  readonly terminal: TerminalRule;
  readonly socKwh: Float64Array;
  readonly chargeKw: Float64Array;
  readonly dischargeKw: Float64Array;
  readonly storedEnergyValue: Float64Array;
  /**
   * Steps (absolute) whose entries this window recomputed. Every other step of
   * the window was in the previous window's plan of the same run, with the same
   * entries, so figures over consecutive plans can be updated where they changed
   * (first window: every step).
   */
  readonly recomputedSteps: Int32Array;
}

export interface DpClosedLoopResult {
  /** The realized schedule over all steps (applied parts of each window). Objective = cost − the problem's terminal value. */
  readonly solution: DpSolution;
  readonly windows: number;
  readonly stats: DpWorkStats;
}

/** A problem prepared once for several closed-loop runs (the stage costs do not depend on the window). */
export interface DpClosedLoop {
  readonly problem: DispatchProblem;
  readonly stages: StageTable;
  run(options: DpClosedLoopOptions): DpClosedLoopResult;
}

/**
 * Prepares receding-horizon runs on the exact dynamic program (DESIGN
 * section 1: re-plan every `replanSteps` over `horizonSteps`, apply only the
 * first steps). Build it once per problem and call `run` for each horizon and
 * terminal rule; warm reuse between consecutive windows makes a run cost
 * roughly the decision horizon per window instead of the full lookahead.
 *
 * @example
 *   const loop = createDpClosedLoop(problem);
 *   const { solution } = loop.run({ horizonSteps: 24, replanSteps: 1 });
 */
export function createDpClosedLoop(problem: DispatchProblem): DpClosedLoop {
  const bad = checkDpInput(problem);
  const eligible = canSolveWithDp(problem);
  // Nothing to build for a model that `run` will refuse anyway.
  const stages = buildStageTable(bad === null && eligible.ok ? problem : { ...problem, priceImport: [] });
  return {
    problem,
    stages,
    run(options) {
      if (bad !== null) return failed(emptyDpSolution('error', bad));
      if (!eligible.ok) return failed(emptyDpSolution('error', `the dynamic program cannot solve this model: ${eligible.reason}`));
      return runWindows(makeContext(problem, stages), options);
    },
  };
}

/** One-shot form of createDpClosedLoop(problem).run(options). */
export function runClosedLoopDp(problem: DispatchProblem, options: DpClosedLoopOptions): DpClosedLoopResult {
  return createDpClosedLoop(problem).run(options);
}

const noWork = (): DpWorkStats => ({ backwardSteps: 0, backwardStepsReused: 0, forwardSteps: 0, forwardStepsReused: 0 });

function failed(solution: DpSolution, windows = 0, stats = noWork()): DpClosedLoopResult {
  return { solution, windows, stats };
}

function runWindows(ctx: DpContext, o: DpClosedLoopOptions): DpClosedLoopResult {
  const p = ctx.problem;
  const n = p.priceImport.length;
  const h = o.horizonSteps;
  const r = o.replanSteps;
  if (!(Number.isInteger(h) && h >= 1)) return failed(emptyDpSolution('error', `horizonSteps must be a whole number ≥ 1, got ${h}`));
  if (!(Number.isInteger(r) && r >= 1 && r <= h)) {
    return failed(emptyDpSolution('error', `replanSteps must be a whole number from 1 to the horizon (${h} steps), got ${r}`));
  }
  const warm = o.warm ?? true;
  const solver = new WindowSolver(ctx, Math.min(h, n));
  const realized = new PlanSeries(n);
  const soc = o.onPlan ? new Float64Array(Math.min(h, n) + 1) : null;
  let e = p.initialEnergyKwh;
  let windows = 0;
  for (let s = 0; s < n; s += r) {
    const end = Math.min(s + h, n);
    const applyTo = Math.min(s + r, n);
    const rule = o.terminalForWindow ? o.terminalForWindow(s, end) : p.terminal;
    const failure = solver.solveWindow(s, end, e, rule, o.onPlan ? end : applyTo, warm);
    windows++;
    if (failure !== null) {
      return failed(emptyDpSolution('infeasible', `the window starting at step ${s} has no feasible plan: ${failure}`), windows, solver.stats);
    }
    if (soc && o.onPlan) {
      const view = solver.planViews(s, end);
      soc[0] = e;
      soc.set(view.y, 1);
      o.onPlan({
        startStep: s, endStep: end, terminal: rule, socKwh: soc.subarray(0, end - s + 1),
        chargeKw: view.c, dischargeKw: view.d, storedEnergyValue: view.value,
        recomputedSteps: solver.recomputed.subarray(0, solver.recomputedCount),
      });
    }
    realized.copyFrom(solver, s, applyTo, 0);
    e = realized.y[applyTo - 1] ?? e;
  }
  const sol = realized.toSolution(p, 0, p.initialEnergyKwh, o.intervals === true);
  return {
    solution: { ...sol, objective: sol.cost - terminalValue(p.terminal, e) },
    windows,
    stats: solver.stats,
  };
}
