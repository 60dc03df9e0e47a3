import type { DispatchProblem, TerminalRule } from '../types';
import { backwardStep } from './backward-step';
import { writeTerminal } from './context';
import { solveDispatchDp } from './solve';
import type { DpValueFunctions } from './value-functions';
import { shapesEqual, ValueStore } from './value-store';

export type DecisionHorizon =
  | {
      readonly ok: true;
      /** The first steps whose decisions are certified. */
      readonly decisionSteps: number;
      /** Smallest lookahead D (steps from the start) such that every truncation at D′ ≥ D leaves V_1..V_steps, hence those decisions, unchanged. */
      readonly depthSteps: number;
      readonly depthHours: number;
      /** How far past the last certified decision the prices still matter, hours. */
      readonly beyondHours: number;
      /** True when even the whole problem was needed: more data might lengthen it. */
      readonly limitedByData: boolean;
    }
  | { readonly ok: false; readonly error: string };

/**
 * The decision horizon: for the plan's first `steps` decisions, the
 * backward depth after which V stops changing, i.e. how far ahead prices and
 * loads actually matter. For every truncation D′ from the end down, a backward
 * pass from the problem's terminal rule at D′ runs until its V_t equals the
 * full problem's V_t bit for bit (then all earlier V agree); the answer is one
 * more than the largest D′ that fails to agree by step `steps`. Exact, not
 * estimated: decisions with any lookahead ≥ depthSteps are identical.
 * `solved`: value functions of this very problem, when already at hand.
 * `terminalAt(cut)`: the rule a plan with lookahead `cut` would end with, when it
 * depends on where the plan ends (the steady-value rule prices end energy at the
 * steady cycle's value for that time of day); by default the problem's own rule.
 */
export function decisionHorizon(
  problem: DispatchProblem,
  steps: number,
  solved?: DpValueFunctions,
  terminalAt: (cut: number) => TerminalRule = () => problem.terminal,
): DecisionHorizon {
  const n = problem.priceImport.length;
  if (!(Number.isInteger(steps) && steps >= 1 && steps <= n)) {
    return { ok: false, error: `steps must be a whole number from 1 to ${n}, got ${steps}` };
  }
  let vf = solved;
  if (!vf) {
    const full = solveDispatchDp(problem, { keepValueFunctions: true });
    if (!full.valueFunctions) return { ok: false, error: full.message ?? `the problem has no solution (${full.status})` };
    vf = full.valueFunctions;
  }
  const ctx = vf.ctx;
  const ref = vf.store;
  const scratch = new ValueStore(2);
  let depth = steps;
  for (let cut = n - 1; cut >= steps; cut--) {
    let cur = 0;
    let agrees =
      writeTerminal(ctx, scratch, cur, terminalAt(cut), problem.initialEnergyKwh) && shapesEqual(scratch, cur, ref, vf.slot(cut));
    for (let t = cut - 1; !agrees && t >= steps; t--) {
      if (!backwardStep(scratch, 1 - cur, cur, ctx.stages, t, ctx.retention, ctx.emin, ctx.emax, ctx.tol)) break;
      cur = 1 - cur;
      agrees = shapesEqual(scratch, cur, ref, vf.slot(t));
    }
    if (!agrees) {
      depth = cut + 1;
      break;
    }
  }
  const dt = problem.stepHours;
  return {
    ok: true,
    decisionSteps: steps,
    depthSteps: depth,
    depthHours: depth * dt,
    beyondHours: (depth - steps) * dt,
    limitedByData: depth === n && n > steps,
  };
}
