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
  /** SoC at the end of each step: socKwh without its first entry. */
  readonly endSocKwh: Float64Array;
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
 * Prepares receding-horizon runs on the exact dynamic program (re-plan every
 * `replanSteps` over `horizonSteps`, apply only the first steps). Build it
 * once per problem and call `run` for each horizon and terminal rule; warm
 * reuse between consecutive windows makes a run cost roughly the decision
 * horizon per window instead of the full lookahead.
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
      if (!eligible.ok)
        return failed(emptyDpSolution('error', `the dynamic program cannot solve this model: ${eligible.reason}`));
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
  if (!(Number.isInteger(h) && h >= 1))
    return failed(emptyDpSolution('error', `horizonSteps must be a whole number ≥ 1, got ${h}`));
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
      return failed(
        emptyDpSolution('infeasible', `the window starting at step ${s} has no feasible plan: ${failure}`),
        windows,
        solver.stats,
      );
    }
    if (soc && o.onPlan) o.onPlan(new RingPlanView(solver, s, end, rule, e, soc));
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

/**
 * A window's plan as views of the solver's rings, each made on first use: a
 * run hands out thousands of plans and most readers look at one or two series.
 */
class RingPlanView implements DpWindowPlan {
  private soc?: Float64Array;
  private endSoc?: Float64Array;
  private charge?: Float64Array;
  private discharge?: Float64Array;
  private value?: Float64Array;
  private recomputed?: Int32Array;

  constructor(
    private readonly solver: WindowSolver,
    readonly startStep: number,
    readonly endStep: number,
    readonly terminal: TerminalRule,
    private readonly e0: number,
    private readonly socBuffer: Float64Array,
  ) {}

  private ring(series: Float64Array): Float64Array {
    const r = this.solver.ringIndex(this.startStep);
    return series.subarray(r, r + this.endStep - this.startStep);
  }

  get socKwh(): Float64Array {
    if (!this.soc) {
      this.socBuffer[0] = this.e0;
      this.socBuffer.set(this.endSocKwh, 1);
      this.soc = this.socBuffer.subarray(0, this.endStep - this.startStep + 1);
    }
    return this.soc;
  }

  get endSocKwh(): Float64Array {
    return (this.endSoc ??= this.ring(this.solver.plan.y));
  }

  get chargeKw(): Float64Array {
    return (this.charge ??= this.ring(this.solver.plan.c));
  }

  get dischargeKw(): Float64Array {
    return (this.discharge ??= this.ring(this.solver.plan.d));
  }

  get storedEnergyValue(): Float64Array {
    return (this.value ??= this.ring(this.solver.plan.value));
  }

  get recomputedSteps(): Int32Array {
    return (this.recomputed ??= this.solver.recomputed.subarray(0, this.solver.recomputedCount));
  }
}
