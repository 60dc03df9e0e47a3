import type { DispatchProblem, TerminalRule } from '../types';
import { decisionHorizon } from './decision-horizon';
import { solveDispatchDp } from './solve';
import { valueCurves } from './value-curves';

/** What the exact DP adds to a plan: the decision horizon and value curves. */
export interface DpPlanInsights {
  /**
   * Lookahead from the delivery start (hours) after which no price or load
   * changes any delivery decision; equal to the plan's lookahead when even the
   * last step still mattered (then `limitedByData`).
   */
  readonly decisionHorizonHours: number;
  /** Hours of it beyond the end of the delivery window. */
  readonly beyondDeliveryHours: number;
  readonly limitedByData: boolean;
  /** Stored-energy value (currency/MWh) against SoC (%) at the chosen steps; time is ISO 8601 UTC. */
  readonly valueCurves: readonly {
    readonly time: string;
    readonly points: readonly { readonly socPct: number; readonly value: number }[];
  }[];
}

/**
 * Decision horizon of the first `deliverySteps` decisions and value curves at
 * the given step indexes of a plan problem the DP can solve (else null).
 * `terminalAt(cut)`: the rule a plan of lookahead `cut` steps would end with.
 */
export function planInsights(
  problem: DispatchProblem,
  deliverySteps: number,
  curveSteps: readonly number[],
  terminalAt?: (cut: number) => TerminalRule,
): DpPlanInsights | null {
  const solved = solveDispatchDp(problem, { keepValueFunctions: true }).valueFunctions;
  if (!solved) return null;
  const dh = decisionHorizon(problem, deliverySteps, solved, terminalAt);
  if (!dh.ok) return null;
  const times = curveSteps.map((t) => problem.timesMs[t] ?? Number.NaN);
  const curves = valueCurves(problem, solved, times);
  if (!curves.ok) return null;
  return {
    decisionHorizonHours: dh.depthHours,
    beyondDeliveryHours: dh.beyondHours,
    limitedByData: dh.limitedByData,
    valueCurves: curves.curves.map((c) => ({ time: new Date(c.time).toISOString(), points: c.points })),
  };
}
