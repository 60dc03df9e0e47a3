/**
 * Closed-loop receding-horizon control (economic MPC) over [from, to): at every
 * re-plan, solve the window [s, min(s + H, to)) from the current state, apply its
 * first `replanSteps` steps, move on. The window never reads past `to`, so the
 * result compares fairly with the reference path over the same period. A demand
 * charge sees the peak reached so far and a throughput cap the energy already
 * discharged that day, so each window prices only what it can still change.
 */
import type { DispatchProblem, DispatchSolution, PowerSeries, ScheduleSeries } from '../types';
import { createDpClosedLoop, type DpClosedLoop, type DpWindowPlan } from '../dp';
import type { AlignedInputs } from '../inputs/align-inputs';
import type { LpBasis } from '../lp/lp-model';
import type { DispatchModel } from '../model/build-dispatch-model';
import { HighsSession } from '../lp/solve';
import { problemFor, usableEnergyKwh } from '../inputs/problem-for';
import { validateProblem } from '../model/validate-problem';
import { scheduleCost } from '../dispatch/schedule-cost';
import { solveDispatchLp } from '../dispatch/solve-dispatch-lp';
import { checkDp, solveWithDp } from '../dispatch/dp-bridge';
import type { SteadyCycle } from '../steady/solve-steady-cycle';
import { terminalRuleFor, type TerminalChoice } from '../terminal/terminal-choice';
import { arcFigures, DEFAULT_BAND_FRACTION } from '../turnpike/turnpike-figures';
import { SlidingArcFigures } from '../turnpike/sliding-arc-figures';
import { carriedLimits } from '../limits/closed-loop-limits';

export interface ClosedLoopRequest {
  readonly from: number;
  readonly to: number;
  readonly horizonSteps: number;
  readonly replanSteps: number;
  readonly terminal: TerminalChoice;
  readonly initialEnergyKwh: number;
  /** Needed for steady-value. */
  readonly steady?: SteadyCycle;
  /** Reference SoC at the end of each step of [from, to), for the open-loop plans' figures. */
  readonly referenceSoc?: readonly number[];
  readonly bandFraction?: number;
  readonly method?: 'auto' | 'lp' | 'dp';
  /** Stop applying steps here (exclusive; default `to`); windows still look ahead up to `to`. */
  readonly stopAt?: number;
}

/** Turnpike figures of each open-loop plan, by the grid step where its window starts. */
export interface PlanLog {
  readonly start: number[];
  readonly share: number[];
  readonly leaving: number[];
  /** 1 when a full-length plan's leaving arc reaches into the steps it commits. */
  readonly intoCommitted: number[];
}

/** The applied schedule over [from, to) and the run's figures. */
export interface ClosedLoopRun extends ScheduleSeries {
  readonly status: DispatchSolution['status'];
  readonly message?: string;
  /** Realised money paid over [from, to), same rule as the reference path. */
  readonly cost: number;
  readonly equivalentCycles: number;
  readonly solves: number;
  readonly seconds: number;
  /** Mean over open-loop plans of the share of steps within the band of the reference. */
  readonly nearSteadyShare: number;
  readonly meanLeavingArcSteps: number;
  /** Full-length plans whose leaving arc reaches into the steps they commit. */
  readonly leavingIntoCommitted: number;
  readonly method: 'lp' | 'dp' | 'mixed';
  /** Per-plan figures of the LP loop (when a reference SoC was given). */
  readonly plans?: PlanLog;
}

export function failedRun(status: ClosedLoopRun['status'], message: string, seconds: number): ClosedLoopRun {
  return {
    status,
    message,
    cost: NaN,
    equivalentCycles: NaN,
    solves: 0,
    seconds,
    chargeKw: [],
    dischargeKw: [],
    gridImportKw: [],
    gridExportKw: [],
    socKwh: [],
    nearSteadyShare: NaN,
    meanLeavingArcSteps: NaN,
    leavingIntoCommitted: 0,
    method: 'lp',
  };
}

export function runClosedLoop(inputs: AlignedInputs, req: ClosedLoopRequest): ClosedLoopRun {
  const started = performance.now();
  const elapsed = () => (performance.now() - started) / 1000;
  const whole = problemFor(
    inputs,
    req.from,
    req.to,
    req.initialEnergyKwh,
    terminalRuleFor(req.terminal, inputs, req.to, req.steady),
  );
  const issue = validateProblem(whole);
  if (issue) return failedRun('error', issue.message, elapsed());
  const usable = usableEnergyKwh(inputs.battery);
  const band = req.bandFraction ?? DEFAULT_BAND_FRACTION;
  if (req.method !== 'lp' && checkDp(whole).ok) return runClosedLoopOnDp(inputs, req, whole, usable, band, elapsed);
  const session = new HighsSession();
  const applied: { -readonly [K in keyof PowerSeries]: number[] } = {
    chargeKw: [],
    dischargeKw: [],
    gridImportKw: [],
    gridExportKw: [],
  };
  const socKwh = [req.initialEnergyKwh];
  let basis: LpBasis | undefined;
  let model: DispatchModel | undefined;
  let solves = 0,
    shareSum = 0,
    leavingSum = 0,
    leavingIntoCommitted = 0,
    peak = 0,
    dpSolves = 0;
  const plans: PlanLog = { start: [], share: [], leaving: [], intoCommitted: [] };
  const stopAt = req.stopAt ?? req.to;
  // Ramp and switching cost continue from the power applied last; reserve revenue is cash of the applied steps.
  const carried = carriedLimits(whole);
  try {
    for (let s = req.from; s < stopAt; s += req.replanSteps) {
      const end = Math.min(req.to, s + req.horizonSteps);
      const day = inputs.clock.localDay[s]!;
      let dischargedToday = 0;
      for (let t = s - 1; t >= req.from && inputs.clock.localDay[t] === day; t--)
        dischargedToday += applied.dischargeKw[t - req.from]! * inputs.stepHours;
      const problem = problemFor(
        inputs,
        s,
        end,
        socKwh[socKwh.length - 1]!,
        terminalRuleFor(req.terminal, inputs, end, req.steady),
        {
          peakFloorKw: peak,
          dischargedFirstDayKwh: dischargedToday,
          ...carried.extras(applied),
        },
      );
      let plan: DispatchSolution | null = req.method !== 'lp' && checkDp(problem).ok ? solveWithDp(problem) : null;
      if (plan) dpSolves++;
      else {
        const outcome = solveDispatchLp(problem, {
          session,
          validated: true,
          keepBasis: true,
          ...(basis ? { warmStart: { previous: basis, shift: req.replanSteps } } : {}),
          ...(model ? { previousModel: model } : {}),
        });
        plan = outcome.solution;
        basis = outcome.basis;
        model = outcome.model;
      }
      solves++;
      if (plan.status !== 'optimal') {
        return failedRun(
          plan.status,
          `window from ${new Date(inputs.timesMs[s]!).toISOString()}: ${plan.message ?? plan.status}`,
          elapsed(),
        );
      }
      const steps = Math.min(req.replanSteps, end - s, stopAt - s);
      carried.apply(problem, plan, steps);
      for (let k = 0; k < steps; k++) {
        applied.chargeKw.push(plan.chargeKw[k]!);
        applied.dischargeKw.push(plan.dischargeKw[k]!);
        applied.gridImportKw.push(plan.gridImportKw[k]!);
        applied.gridExportKw.push(plan.gridExportKw[k]!);
        socKwh.push(plan.socKwh[k + 1]!);
        peak = Math.max(peak, plan.gridImportKw[k]!);
      }
      if (req.referenceSoc) {
        const fig = arcFigures(plan.socKwh.slice(1), req.referenceSoc.slice(s - req.from, end - req.from), usable, band);
        shareSum += fig.nearSteadyShare;
        leavingSum += fig.leavingArcSteps;
        const fullLength = end - s === req.horizonSteps;
        const into = fullLength && fig.leavingArcSteps > 0 && end - s - fig.leavingArcSteps < req.replanSteps ? 1 : 0;
        leavingIntoCommitted += into;
        plans.start.push(s);
        plans.share.push(fig.nearSteadyShare);
        plans.leaving.push(fig.leavingArcSteps);
        plans.intoCommitted.push(into);
      }
    }
  } finally {
    session.dispose();
  }
  const cost =
    scheduleCost(
      { ...whole, degradationCostPerMwh: inputs.battery.degradationCostPerMwh, demandChargePerKw: inputs.site.demandChargePerKw },
      applied,
    ) - carried.reserveRevenue;
  const discharged = applied.dischargeKw.reduce((sum, d) => sum + d * inputs.stepHours, 0);
  return {
    status: 'optimal',
    cost,
    equivalentCycles: discharged / usable,
    solves,
    seconds: elapsed(),
    ...applied,
    socKwh,
    nearSteadyShare: req.referenceSoc ? shareSum / solves : NaN,
    meanLeavingArcSteps: req.referenceSoc ? leavingSum / solves : NaN,
    leavingIntoCommitted,
    method: dpSolves === 0 ? 'lp' : dpSolves === solves ? 'dp' : 'mixed',
    ...(req.referenceSoc ? { plans } : {}),
  };
}

/** Prepared DP loops per inputs and period: the runs of a study share their stage costs. */
const dpLoops = new WeakMap<AlignedInputs, Map<string, DpClosedLoop>>();

function dpLoopFor(inputs: AlignedInputs, req: ClosedLoopRequest, whole: DispatchProblem): DpClosedLoop {
  const key = `${req.from}:${req.to}:${req.initialEnergyKwh}`;
  let loops = dpLoops.get(inputs);
  if (!loops) dpLoops.set(inputs, (loops = new Map()));
  let loop = loops.get(key);
  if (!loop) loops.set(key, (loop = createDpClosedLoop(whole)));
  return loop;
}

/**
 * The same closed loop on the exact dynamic program's warm receding-horizon
 * runner: consecutive windows reuse value functions and decisions,
 * bit-identical to solving each window cold; figures as in the LP loop above.
 */
function runClosedLoopOnDp(
  inputs: AlignedInputs,
  req: ClosedLoopRequest,
  whole: DispatchProblem,
  usable: number,
  band: number,
  elapsed: () => number,
): ClosedLoopRun {
  let shareSum = 0,
    leavingSum = 0,
    leavingIntoCommitted = 0;
  // Consecutive plans differ in a few steps: update the figures there only (thousands of windows per run).
  const figures = req.referenceSoc ? new SlidingArcFigures(req.referenceSoc, usable, band) : null;
  const run = dpLoopFor(inputs, req, whole).run({
    horizonSteps: req.horizonSteps,
    replanSteps: req.replanSteps,
    terminalForWindow: (_start, end) => terminalRuleFor(req.terminal, inputs, req.from + end, req.steady),
    ...(figures
      ? {
          onPlan: (plan: DpWindowPlan) => {
            const fig = figures.update(plan.startStep, plan.endStep, plan.endSocKwh, plan.recomputedSteps);
            shareSum += fig.nearSteadyShare;
            leavingSum += fig.leavingArcSteps;
            const steps = plan.endStep - plan.startStep;
            if (steps === req.horizonSteps && fig.leavingArcSteps > 0 && steps - fig.leavingArcSteps < req.replanSteps)
              leavingIntoCommitted++;
          },
        }
      : {}),
  });
  const sol = run.solution;
  if (sol.status !== 'optimal') return failedRun(sol.status, sol.message ?? sol.status, elapsed());
  const discharged = sol.dischargeKw.reduce((sum, d) => sum + d * inputs.stepHours, 0);
  return {
    status: 'optimal',
    cost: scheduleCost(
      { ...whole, degradationCostPerMwh: inputs.battery.degradationCostPerMwh, demandChargePerKw: inputs.site.demandChargePerKw },
      sol,
    ),
    equivalentCycles: discharged / usable,
    solves: run.windows,
    seconds: elapsed(),
    chargeKw: sol.chargeKw,
    dischargeKw: sol.dischargeKw,
    gridImportKw: sol.gridImportKw,
    gridExportKw: sol.gridExportKw,
    socKwh: sol.socKwh,
    nearSteadyShare: req.referenceSoc ? shareSum / run.windows : NaN,
    meanLeavingArcSteps: req.referenceSoc ? leavingSum / run.windows : NaN,
    leavingIntoCommitted,
    method: 'dp',
  };
}
