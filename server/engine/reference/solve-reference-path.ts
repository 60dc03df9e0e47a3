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

export interface PathRequest {
  readonly from?: number;
  readonly to?: number;
  /** Initial SoC in % of nameplate energy; default the battery's socInitialPct. */
  readonly initialSocPct?: number;
  readonly terminal?: TerminalChoice;
  /** Steady cycle for steady-value (solved from all the data when absent). */
  readonly steady?: SteadyCycle;
  readonly method?: DispatchOptions['method'];
}

export interface ReferencePath {
  readonly from: number;
  readonly to: number;
  readonly terminalRule: TerminalRule;
  readonly solution: DispatchSolution;
  readonly steady?: SteadyCycle;
}

export type PathResult = { ok: true; path: ReferencePath } | { ok: false; issue: InputIssue };

/** The steady cycle (over the chosen local days) when a terminal choice needs it; an issue when it cannot be had. */
export function steadyFor(
  inputs: AlignedInputs,
  choices: readonly TerminalChoice[],
  given?: SteadyCycle,
  days: DaySelection = 'all',
): { ok: true; steady?: SteadyCycle } | { ok: false; issue: InputIssue } {
  if (!choices.some((c) => c.kind === 'steady-value')) return { ok: true, ...(given ? { steady: given } : {}) };
  if (given) return { ok: true, steady: given };
  const result = solveSteadyCycle(inputs, { days });
  if (!result.ok) return result;
  if (result.cycle.status !== 'optimal') {
    return {
      ok: false,
      issue: {
        field: 'terminal',
        message: `the steady-value rule needs the steady cycle, which could not be solved: ${result.cycle.message ?? result.cycle.status}`,
      },
    };
  }
  return { ok: true, steady: result.cycle };
}

export function solveReferencePath(inputs: AlignedInputs, request: PathRequest = {}): PathResult {
  const from = request.from ?? 0;
  const to = request.to ?? inputs.timesMs.length;
  if (!(to > from)) return { ok: false, issue: { field: 'end', message: 'the end must be after the start' } };
  const choice = request.terminal ?? { kind: 'free' };
  const steady = steadyFor(inputs, [choice], request.steady);
  if (!steady.ok) return steady;
  const terminalRule = terminalRuleFor(choice, inputs, to, steady.steady);
  const e0 = socPctToKwh(inputs, request.initialSocPct ?? inputs.battery.socInitialPct);
  const solution = solveDispatch(problemFor(inputs, from, to, e0, terminalRule), { method: request.method ?? 'auto' });
  return { ok: true, path: { from, to, terminalRule, solution, ...(steady.steady ? { steady: steady.steady } : {}) } };
}
