/**
 * The steady value at the end of each slot, as a terminal value needs it: the
 * worth of energy carried past that instant into the rest of the cycle. Inside
 * the SoC window it is the dual of the SoC row (unique there). Where the SoC sits
 * at a bound the dual is not unique: any value between the two one-sided
 * derivatives of the cost is optimal (docs/sources.md: degeneracy), a solver
 * returns either, and the dual of slot t's own row also counts energy that slot t
 * could still discharge. So there we measure the one-sided value on the side the
 * SoC can move to, by re-solving the small steady LP with a little energy removed
 * (full) or added (empty) at the start of the next slot (row t + 1, cyclically):
 *   full:  λ = 1000·(z(−h) − z*)/h      empty:  λ = 1000·(z* − z(+h))/h
 * Exact while h is below the distance to the next kink of the piecewise-linear
 * cost (kinks sit hundreds of kWh apart here); h = 1e-3 of the usable energy.
 */
import { solve } from '../lp/solve';
import type { DispatchModel } from '../model/build-dispatch-model';

export function oneSidedValues(
  model: DispatchModel,
  objective: number,
  socKwh: readonly number[],
  values: readonly number[],
  bounds: { min: number; max: number },
): number[] {
  const { lp, layout } = model;
  const h = 1e-3 * (bounds.max - bounds.min);
  const tol = 1e-7 * Math.max(1, bounds.max);
  return values.map((value, t) => {
    const e = socKwh[t + 1]!;
    const full = e >= bounds.max - tol;
    const empty = e <= bounds.min + tol;
    if (!full && !empty) return value;
    const delta = full ? -h : h;
    const row = ((t + 1) % layout.steps) * layout.rowsPerStep + layout.socRow;
    const rowLower = Float64Array.from(lp.rowLower);
    const rowUpper = Float64Array.from(lp.rowUpper);
    rowLower[row]! += delta;
    rowUpper[row]! += delta;
    const result = solve({ ...lp, rowLower, rowUpper });
    if (result.status !== 'optimal') return value;
    return full ? (1000 * (result.objective - objective)) / h : (1000 * (objective - result.objective)) / h;
  });
}
