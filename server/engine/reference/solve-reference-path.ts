/**
 * The reference path: one LP over a whole period [from, to) from a given initial
 * SoC with a chosen terminal rule (the longest horizon we can
 * solve). Horizon studies compare their closed-loop runs with it.
 */
import type { DispatchSolution, TerminalRule } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import type { InputIssue } from '../model/validate-battery';
import { problemFor, socPctToKwh } from '../inputs/problem-for';
import { solveDispatch, type DispatchOptions } from '../dispatch/solve-dispatch';
import { solveSteadyCycle, type SteadyCycle } from '../steady/solve-steady-cycle';
import type { DaySelection } from '../steady/representative-day';
import { terminalRuleFor, type TerminalChoice } from '../terminal/terminal-choice';
import { netFigures, type NetFigures } from '../value/net-figures';

export interface PathRequest {
  readonly from?: number;
  readonly to?: number;
  /** Initial SoC in % of nameplate energy; default the battery's socInitialPct. */
  readonly initialSocPct?: number;
  /** Net power (discharge − charge, kW) before the start, from which a ramp rate and switching cost apply. */
  readonly initialNetPowerKw?: number;
  readonly terminal?: TerminalChoice;
  /** Steady cycle for steady-value and for valuing stored energy (solved when absent). */
  readonly steady?: SteadyCycle;
  /** Which local days the steady cycle averages when it is solved here (default all). */
  readonly steadyDays?: DaySelection;
  readonly method?: DispatchOptions['method'];
}

export interface ReferencePath {
  readonly from: number;
  readonly to: number;
  readonly terminalRule: TerminalRule;
  readonly solution: DispatchSolution;
  readonly steady?: SteadyCycle;
  /** Cash, stored energy valued at the steady cycle, net (DESIGN section 3.1); null unless the solution is optimal. */
  readonly netFigures: NetFigures | null;
}

export type PathResult = { ok: true; path: ReferencePath } | { ok: false; issue: InputIssue };

export type SteadyForResult =
  | {
      ok: true;
      steady?: SteadyCycle;
      /** Why stored energy cannot be valued, when there is no steady cycle. */ unvalued?: string;
    }
  | { ok: false; issue: InputIssue };

/**
 * The steady cycle (over the chosen local days): needed by the steady-value rule
 * and to value stored energy. An issue when a terminal choice needs it and it
 * cannot be had; otherwise, without one, the reason stored energy goes unvalued.
 */
export function steadyFor(
  inputs: AlignedInputs,
  choices: readonly TerminalChoice[],
  given?: SteadyCycle,
  days: DaySelection = 'all',
): SteadyForResult {
  if (given) return { ok: true, steady: given };
  const needed = choices.some((c) => c.kind === 'steady-value');
  const result = solveSteadyCycle(inputs, { days });
  const why = !result.ok
    ? result.issue.message
    : result.cycle.status !== 'optimal'
      ? `the steady cycle could not be solved: ${result.cycle.message ?? result.cycle.status}`
      : null;
  if (why === null && result.ok) return { ok: true, steady: result.cycle };
  if (!needed) return { ok: true, unvalued: why ?? 'there is no steady cycle' };
  if (!result.ok) return result;
  return {
    ok: false,
    issue: { field: 'terminal', message: `the steady-value rule needs the steady cycle, which could not be solved: ${why}` },
  };
}

export function solveReferencePath(inputs: AlignedInputs, request: PathRequest = {}): PathResult {
  const from = request.from ?? 0;
  const to = request.to ?? inputs.timesMs.length;
  if (!(to > from)) return { ok: false, issue: { field: 'end', message: 'the end must be after the start' } };
  const choice = request.terminal ?? { kind: 'free' };
  const steady = steadyFor(inputs, [choice], request.steady, request.steadyDays);
  if (!steady.ok) return steady;
  const terminalRule = terminalRuleFor(choice, inputs, to, steady.steady);
  const e0 = socPctToKwh(inputs, request.initialSocPct ?? inputs.battery.socInitialPct);
  const extras = request.initialNetPowerKw !== undefined ? { initialNetPowerKw: request.initialNetPowerKw } : {};
  const solution = solveDispatch(problemFor(inputs, from, to, e0, terminalRule, extras), { method: request.method ?? 'auto' });
  const net =
    solution.status === 'optimal'
      ? netFigures(
          inputs,
          from,
          to,
          { ...solution, startEnergyKwh: solution.socKwh[0]!, endEnergyKwh: solution.socKwh[to - from]! },
          steady.steady,
          steady.unvalued,
        )
      : null;
  return {
    ok: true,
    path: { from, to, terminalRule, solution, ...(steady.steady ? { steady: steady.steady } : {}), netFigures: net },
  };
}
