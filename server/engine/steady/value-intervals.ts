/**
 * The steady cycle's stored-energy value λ̄ of slot t: the value of energy held
 * at the END of slot t, the convention of a plan's λ_t (DESIGN section 3), i.e.
 * −1000·∂z/∂b_t for energy b_t handed to the battery on the SoC row of e_{t+1}.
 * Where the SoC sits at a bound, or the battery idles, z is not differentiable
 * there and every value in [low, high] is an optimal dual (REFERENCES:
 * degeneracy): low = −1000·z′₊ (one more kWh), high = −1000·z′₋ (one kWh less).
 * We report the midpoint, the rule the dynamic program uses for plans; it is
 * the derivative itself wherever that is unique. Each end lies inside the KKT
 * bounds of slot t's own charge and discharge, because it is an optimal dual.
 *
 * Both ends come from tangent LPs (tangent-lp.ts), which give the one-sided
 * derivatives exactly. Without a demand charge or throughput cap, the optimal
 * duals form a lattice (each reduced cost links at most two duals with opposite
 * signs: μ_t − a·μ_{t+1}, β_t − η·μ_t, …), so one tangent LP that adds 1 kWh to
 * every SoC row gives every slot's `low` at once, and one that removes it every
 * `high`. With those couplings each slot gets its own pair of tangent LPs.
 */
import { solve } from '../lp/solve';
import type { LpModel } from '../lp/lp-model';
import type { DispatchModel } from '../model/build-dispatch-model';
import { tangentLp } from './tangent-lp';

export interface ValueIntervals {
  /** Reported λ̄ per slot, currency/MWh. */
  readonly value: number[];
  readonly low: number[];
  readonly high: number[];
}

function socRow(model: DispatchModel, t: number): number {
  return t * model.layout.rowsPerStep + model.layout.socRow;
}

/** The optimal dual of the tangent LP for adding `sign` kWh to the SoC rows of `slots`, or null. */
function tangentSolve(model: DispatchModel, x: Float64Array, slots: readonly number[], sign: number) {
  const delta = new Float64Array(model.lp.numRows);
  for (const t of slots) delta[socRow(model, t)] = sign;
  const tangent: LpModel = tangentLp(model.lp, x, delta);
  const result = solve(tangent);
  return result.status === 'optimal' ? result : null;
}

function latticeEnds(model: DispatchModel, x: Float64Array, n: number): { low: number[]; high: number[] } | null {
  const all = Array.from({ length: n }, (_, t) => t);
  const more = tangentSolve(model, x, all, 1);
  const less = tangentSolve(model, x, all, -1);
  if (!more || !less) return null;
  // Adding energy: the dual maximises Σ y_t, i.e. the least values; removing it: the greatest.
  return {
    low: all.map((t) => -1000 * more.rowDual[socRow(model, t)]! || 0),
    high: all.map((t) => -1000 * less.rowDual[socRow(model, t)]! || 0),
  };
}

function slotEnds(model: DispatchModel, x: Float64Array, n: number): { low: number[]; high: number[] } {
  const low: number[] = [];
  const high: number[] = [];
  for (let t = 0; t < n; t++) {
    // The tangent LP's optimum is the one-sided derivative of the cost per kWh added (removed).
    const more = tangentSolve(model, x, [t], 1);
    const less = tangentSolve(model, x, [t], -1);
    low.push(more ? -1000 * more.objective : -Infinity);
    high.push(less ? 1000 * less.objective : Infinity);
  }
  return { low, high };
}

/**
 * Value intervals and reported values of the steady LP's slots. `x` is an
 * optimal primal of `model.lp`, `duals` the solver's values λ (a valid choice,
 * used where a side is unbounded, e.g. a battery that cannot charge).
 */
export function steadyValueIntervals(model: DispatchModel, x: Float64Array, duals: readonly number[]): ValueIntervals {
  const { layout } = model;
  const n = layout.steps;
  const coupled = layout.peakCol >= 0 || layout.capDays.length > 0;
  const ends = (!coupled && latticeEnds(model, x, n)) || slotEnds(model, x, n);
  const value = duals.map((dual, t) => {
    const lo = ends.low[t]!;
    const hi = ends.high[t]!;
    const tol = 1e-7 * (1 + Math.abs(dual));
    if (Number.isFinite(lo) && Number.isFinite(hi)) return lo <= hi + tol ? (lo + hi) / 2 : dual;
    return Number.isFinite(lo) ? Math.max(lo, dual) : Number.isFinite(hi) ? Math.min(hi, dual) : dual;
  });
  return { value, low: ends.low, high: ends.high };
}
