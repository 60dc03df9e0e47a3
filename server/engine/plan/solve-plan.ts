/**
 * A plan: the delivery window [start, end) solved over a lookahead of
 * `horizonHours` from `start` (data beyond `end` used when available) with a
 * terminal rule at the end of the lookahead. The delivery part is the schedule;
 * the rest is shown as lookahead. Turnpike figures compare it with the steady
 * cycle and with a plan of a much longer lookahead, max(4·H, H + 168 h), from the
 * same state.
 */
import type { DispatchSolution, TerminalRule } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import type { InputIssue } from '../model/validate-battery';
import { problemFor, socPctToKwh, stepIndexOf } from '../inputs/problem-for';
import { solveDispatch, type DispatchOptions } from '../dispatch/solve-dispatch';
import { solveSteadyCycle, type SteadyCycle } from '../steady/solve-steady-cycle';
import type { DaySelection } from '../steady/representative-day';
import { terminalRuleFor, type TerminalChoice } from '../terminal/terminal-choice';
import { DEFAULT_BAND_FRACTION } from '../turnpike/turnpike-figures';
import { batteryWarningMessages } from '@shared/schemas/battery-warnings';
import { planFlags } from './plan-flags';
import { planTurnpike, type PlanTurnpike } from './plan-turnpike';
import { planInsights, type DpPlanInsights } from '../dp';
import { localTimeLabel } from '../time/zone-offsets';
import { netFigures, type NetFigures } from '../value/net-figures';
import { cyclingCheck, type CyclingCheck } from './cycling-check';

export interface PlanRequest {
  readonly startMs: number;
  readonly endMs: number;
  readonly horizonHours: number;
  readonly terminal: TerminalChoice;
  /** Initial SoC in % of nameplate energy; default the battery's socInitialPct. */
  readonly initialSocPct?: number;
  /** Net power (discharge − charge, kW) before the delivery start, from which a ramp rate and switching cost apply. */
  readonly initialNetPowerKw?: number;
  /** SoC band as a fraction of usable energy (default 0.05). */
  readonly bandFraction?: number;
  readonly method?: DispatchOptions['method'];
  readonly steady?: SteadyCycle;
  /** Which local days the steady cycle averages (when `steady` is not given): all, weekdays or weekend days. */
  readonly steadyDays?: DaySelection;
}

export interface Plan {
  /** Grid step of the delivery start, end (exclusive) and lookahead end (exclusive). */
  readonly from: number;
  readonly to: number;
  readonly windowEnd: number;
  readonly lookaheadHours: number;
  readonly terminalRule: TerminalRule;
  /** The solution over the whole lookahead window. */
  readonly solution: DispatchSolution;
  readonly steady: SteadyCycle;
  readonly turnpike: PlanTurnpike;
  readonly warnings: readonly string[];
  /** Decision horizon and value curves (delivery start and each whole local hour) when the exact DP solved the plan, else null. */
  readonly dpInsights: DpPlanInsights | null;
  /** What the delivery window is worth: cash, stored energy valued at the steady cycle, net (docs/model.md). */
  readonly netFigures: NetFigures;
  /** Equivalent full cycles per local day of the delivery window against the battery's rating. */
  readonly cycling: CyclingCheck;
  /**
   * Hours of lookahead of the longer plan the commit window was measured against:
   * max(4·H, H + 168 h), cut where the data end; null when the data end at the
   * horizon, so no longer plan was solved.
   */
  readonly longerLookaheadHours: number | null;
}

export type PlanResult = { ok: true; plan: Plan } | { ok: false; issue: InputIssue };

const fail = (field: string, message: string): PlanResult => ({ ok: false, issue: { field, message } });

export function solvePlan(inputs: AlignedInputs, request: PlanRequest): PlanResult {
  const start = stepIndexOf(inputs, request.startMs, 'the delivery start');
  if (!start.ok) return fail('start', start.message);
  const end = stepIndexOf(inputs, request.endMs, 'the delivery end');
  if (!end.ok) return fail('end', end.message);
  if (end.index <= start.index) return fail('end', 'the delivery end must be after the delivery start');
  const horizonSteps = (request.horizonHours * 60) / inputs.stepMinutes;
  if (!Number.isInteger(horizonSteps) || horizonSteps < 1) {
    return fail('horizon', `the horizon ${request.horizonHours} h is not a whole number of ${inputs.stepMinutes}-minute steps`);
  }
  if (horizonSteps < end.index - start.index) {
    return fail(
      'horizon',
      `the horizon ${request.horizonHours} h is shorter than the delivery window (${((end.index - start.index) * inputs.stepMinutes) / 60} h); use a horizon at least as long as the window`,
    );
  }
  let steady = request.steady;
  if (!steady) {
    const result = solveSteadyCycle(inputs, { days: request.steadyDays ?? 'all' });
    if (!result.ok) return result;
    steady = result.cycle;
  }
  if (steady.status !== 'optimal')
    return fail('prices', `the steady cycle could not be solved: ${steady.message ?? steady.status}`);
  const n = inputs.timesMs.length;
  const from = start.index;
  const windowEnd = Math.min(n, from + horizonSteps);
  const e0 = socPctToKwh(inputs, request.initialSocPct ?? inputs.battery.socInitialPct);
  if (
    request.initialSocPct !== undefined &&
    !(request.initialSocPct >= inputs.battery.socMinPct && request.initialSocPct <= inputs.battery.socMaxPct)
  ) {
    return fail(
      'initialSocPct',
      `the initial SoC ${request.initialSocPct} % is outside the SoC window ${inputs.battery.socMinPct}–${inputs.battery.socMaxPct} %`,
    );
  }
  const options = { method: request.method ?? 'auto' } as const;
  const solveTo = (to: number) => {
    const rule = terminalRuleFor(request.terminal, inputs, to, steady);
    const extras = request.initialNetPowerKw !== undefined ? { initialNetPowerKw: request.initialNetPowerKw } : {};
    return { rule, solution: solveDispatch(problemFor(inputs, from, to, e0, rule, extras), options) };
  };
  const main = solveTo(windowEnd);
  if (main.solution.status !== 'optimal')
    return fail('plan', main.solution.message ?? `the plan could not be solved (${main.solution.status})`);
  const curveSteps = Array.from({ length: end.index - from }, (_, i) => i).filter(
    (i) => i === 0 || inputs.clock.minuteOfDay[from + i]! % 60 === 0,
  );
  // A shorter lookahead ends elsewhere, so under steady-value it prices its end energy at another time of day.
  const ruleAtLookahead = (cut: number) => terminalRuleFor(request.terminal, inputs, from + cut, steady);
  const dpInsights =
    main.solution.method === 'dp'
      ? planInsights(problemFor(inputs, from, windowEnd, e0, main.rule), end.index - from, curveSteps, ruleAtLookahead)
      : null;
  const longerHours = Math.max(4 * request.horizonHours, request.horizonHours + 168);
  const longerEnd = Math.min(n, from + Math.floor((longerHours * 60) / inputs.stepMinutes));
  const longer = longerEnd > windowEnd ? solveTo(longerEnd).solution : null;
  const band = request.bandFraction ?? DEFAULT_BAND_FRACTION;
  const tp = planTurnpike(inputs, from, main.solution, steady, longer?.status === 'optimal' ? longer : null, band);
  const lookedLongerHours = ((longerEnd - from) * inputs.stepMinutes) / 60;
  tp.flags.push(
    ...planFlags(tp, main.solution, {
      stepMinutes: inputs.stepMinutes,
      deliverySteps: end.index - from,
      windowSteps: windowEnd - from,
      requestedHorizonHours: request.horizonHours,
      terminalKind: request.terminal.kind,
      timeOfStep: (t) => localTimeLabel(inputs.site.timezone, inputs.timesMs[0]! + (from + t) * inputs.stepMinutes * 60_000),
      longerHours: longer ? lookedLongerHours : null,
      ...(longer ? {} : { longerMissing: 'the price data end at the horizon, so there is no longer plan to compare with' }),
    }),
  );
  const delivery = end.index - from;
  const sol = main.solution;
  const net = netFigures(
    inputs,
    from,
    end.index,
    {
      dischargeKw: sol.dischargeKw.slice(0, delivery),
      gridImportKw: sol.gridImportKw.slice(0, delivery),
      gridExportKw: sol.gridExportKw.slice(0, delivery),
      startEnergyKwh: sol.socKwh[0]!,
      endEnergyKwh: sol.socKwh[delivery]!,
    },
    steady,
  );
  const cycling = cyclingCheck(inputs, from, sol.dischargeKw.slice(0, delivery));
  return {
    ok: true,
    plan: {
      from,
      to: end.index,
      windowEnd,
      lookaheadHours: ((windowEnd - from) * inputs.stepMinutes) / 60,
      terminalRule: main.rule,
      solution: main.solution,
      steady,
      turnpike: tp,
      // Heavy cycling is a caution about the battery (docs/model.md), beside the settings outside common practice.
      warnings: [...batteryWarningMessages(inputs.battery, inputs.site), ...(cycling.message ? [cycling.message] : [])],
      dpInsights,
      netFigures: net,
      cycling,
      longerLookaheadHours: longer ? lookedLongerHours : null,
    },
  };
}
