import type { DispatchProblem, TerminalRule } from '../types';
import { buildStageTable, type StageTable } from './stage-cost';
import type { ValueStore } from './value-store';

/** Everything the passes need about one problem, computed once and shared by all windows. */
export interface DpContext {
  readonly problem: DispatchProblem;
  readonly stages: StageTable;
  /** Retention per step, a = 1 − σΔt. */
  readonly retention: number;
  /** SoC window (kWh). */
  readonly emin: number;
  readonly emax: number;
  /** Absolute tolerance for energy comparisons (kWh). */
  readonly tol: number;
}

export function makeContext(problem: DispatchProblem, stages?: StageTable): DpContext {
  const b = problem.battery;
  const emin = (b.energyKwh * b.socMinPct) / 100;
  const emax = (b.energyKwh * b.socMaxPct) / 100;
  return {
    problem,
    stages: stages ?? buildStageTable(problem),
    retention: 1 - (b.selfDischargePctPerHour / 100) * problem.stepHours,
    emin,
    emax,
    tol: 1e-9 * Math.max(1, b.energyKwh),
  };
}

/**
 * Writes the terminal value function V_N into `slot` (docs/model.md):
 * `free` is 0 on the window, `steady-value` is −λ̄·e/1000, `target` is 0 on
 * [max(E_min, target), E_max], `cyclic` is the single point e_0 of the window.
 * Returns false when the rule leaves no admissible end energy.
 */
export function writeTerminal(ctx: DpContext, store: ValueStore, slot: number, rule: TerminalRule, e0: number): boolean {
  let lo = ctx.emin;
  let hi = ctx.emax;
  let slope = 0;
  if (rule.kind === 'cyclic') {
    if (e0 < ctx.emin - ctx.tol || e0 > ctx.emax + ctx.tol) return false;
    lo = e0;
    hi = e0;
  } else if (rule.kind === 'target') {
    const target = (ctx.problem.battery.energyKwh * rule.socPct) / 100;
    if (target > ctx.emax + ctx.tol) return false;
    lo = Math.min(Math.max(target, ctx.emin), ctx.emax);
  } else if (rule.kind === 'steady-value') {
    slope = -rule.valuePerMwh / 1000;
  }
  store.lo[slot] = lo;
  store.hi[slot] = hi;
  store.vlo[slot] = slope * lo;
  if (hi > lo) {
    store.count[slot] = 1;
    store.len[slot * store.cap] = hi - lo;
    store.slope[slot * store.cap] = slope;
  } else {
    store.count[slot] = 0;
  }
  return true;
}

/** Value of the end energy under the rule (currency), subtracted from the cost to give the objective. */
export function terminalValue(rule: TerminalRule, endEnergyKwh: number): number {
  return rule.kind === 'steady-value' ? (rule.valuePerMwh * endEnergyKwh) / 1000 : 0;
}
