/**
 * The LP path: validate → build → solve → (tie-break) → read back. Every outcome
 * is a DispatchSolution with a status; bad inputs come back as status 'error'
 * with the validator's message, never as an exception.
 */
import type { DispatchProblem, DispatchSolution, SolveStatus } from '../types';
import type { LpBasis } from '../lp/lp-model';
import { solve, type SolveOptions } from '../lp/solve';
import { buildDispatchModel, energyBounds, type DispatchModel } from '../model/build-dispatch-model';
import { rotateBasis } from '../model/rotate-basis';
import { buildTieBreakModel, mayHaveTies, tieBreakWarmBasis } from '../model/tie-break';
import { stepLabel, validateProblem } from '../model/validate-problem';
import { toDispatchSolution } from './read-solution';
import { limitInfeasibleHint } from '../limits/limit-words';

export interface LpDispatchOptions extends SolveOptions {
  /** Break ties between optimal schedules by the documented rule (default true). */
  readonly tieBreak?: boolean;
  /** Skip input validation (callers that already validated the same inputs). */
  readonly validated?: boolean;
  /** Warm start from the basis of the previous window, moved on by `shift` steps (HiGHS sessions). */
  readonly warmStart?: { readonly previous: LpBasis; readonly shift: number };
  /** The previous window's model, whose matrix is shared when it is the same. */
  readonly previousModel?: DispatchModel;
}

export interface LpDispatchOutcome {
  readonly solution: DispatchSolution;
  /** Stage-1 basis when keepBasis was asked for. */
  readonly basis?: LpBasis;
  /** The model solved, for the next window's previousModel. */
  readonly model?: DispatchModel;
  /** The schedule's values of every LP column (an optimal primal of `model`), when optimal. */
  readonly primal?: Float64Array;
}

export function failedSolution(
  status: Exclude<SolveStatus, 'optimal'>,
  message: string,
  method: 'lp' | 'dp' = 'lp',
): DispatchSolution {
  return {
    status,
    method,
    message,
    objective: Number.NaN,
    cost: Number.NaN,
    chargeKw: [],
    dischargeKw: [],
    gridImportKw: [],
    gridExportKw: [],
    socKwh: [],
    storedEnergyValue: [],
    peakImportKw: Number.NaN,
  };
}

/** Words for an infeasible model, pointing at the first step where the battery is needed. */
function infeasibleMessage(problem: DispatchProblem): string {
  const limit = problem.site.importLimitKw;
  const t = limit === null ? -1 : problem.loadKw.findIndex((l, i) => l - problem.generationKw[i]! > limit);
  const base =
    'No schedule meets every limit (battery power and energy, SoC window, grid limits, throughput cap, terminal rule).';
  return t >= 0
    ? `${base} From ${stepLabel(problem, t)} the load exceeds the import limit and the battery must cover the difference; its usable energy or the daily throughput cap may not last. Raise the import limit, the initial SoC or the cap.`
    : `${base} Check the terminal target, the throughput cap and the grid limits.`;
}

export function solveDispatchLp(problem: DispatchProblem, options: LpDispatchOptions = {}): LpDispatchOutcome {
  const started = performance.now();
  if (!options.validated) {
    const issue = validateProblem(problem);
    if (issue) return { solution: failedSolution('error', issue.message) };
  }
  const model = buildDispatchModel(problem, options.previousModel ? { previous: options.previousModel } : {});
  const warmBasis = options.warmStart
    ? rotateBasis(options.warmStart.previous, model.layout, options.warmStart.shift)
    : undefined;
  // The basis (HiGHS) also makes the tie test exact, so it is always asked for.
  const stage1 = solve(model.lp, { ...options, keepBasis: true, ...(warmBasis ? { warmBasis } : {}) });
  if (stage1.status !== 'optimal') {
    const message =
      stage1.status === 'infeasible'
        ? infeasibleMessage(problem) + limitInfeasibleHint(problem)
        : (stage1.message ?? stage1.status);
    return { solution: failedSolution(stage1.status, message) };
  }
  let finalX = stage1.x;
  let tieBroken = false;
  if (options.tieBreak !== false && mayHaveTies(model, stage1)) {
    const { min, max } = energyBounds(problem);
    const mid = (min + max) / 2;
    const warm = tieBreakWarmBasis(model, stage1, mid);
    const stage2 = solve(
      buildTieBreakModel(model, stage1, problem.stepHours, mid),
      warm ? { backend: 'highs', warmBasis: warm } : {},
    );
    // If the second solve fails (numerically), the stage-1 schedule is still optimal.
    if (stage2.status === 'optimal') {
      finalX = stage2.x;
      tieBroken = true;
    }
  }
  const seconds = (performance.now() - started) / 1000;
  return {
    solution: toDispatchSolution(problem, model, stage1, finalX, { tieBroken, seconds }),
    ...(stage1.basis ? { basis: stage1.basis } : {}),
    model,
    primal: finalX,
  };
}
