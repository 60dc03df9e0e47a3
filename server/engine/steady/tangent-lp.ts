/**
 * The tangent LP of an optimal LP solution x*: the same matrix and costs, with
 * every bound that x* does not touch removed and every bound it touches moved to
 * zero, so the variables are the changes δ of the schedule:
 *   min cᵀδ  s.t.  A·δ = Δb (active inequality rows keep their side),
 *   δ_j ≥ 0 where x*_j sits at its lower bound, ≤ 0 at its upper, free inside.
 * [M] LP sensitivity (e.g. Bertsimas & Tsitsiklis, Introduction to Linear
 * Optimization, 1997, ch. 5, from memory): its optimal value is the exact
 * one-sided derivative of the optimal cost in the direction Δb, and its dual is
 * an optimal dual of the original LP that maximises Δbᵀy over all optimal duals
 * (the tangent LP's dual constraints are dual feasibility plus complementary
 * slackness with x*, which characterise every optimal dual).
 */
import type { LpModel } from '../lp/lp-model';

const tolerance = (lower: number, upper: number) =>
  1e-7 * (1 + Math.max(Number.isFinite(lower) ? Math.abs(lower) : 0, Number.isFinite(upper) ? Math.abs(upper) : 0));

/** Bounds of δ (or of a row's change) for a value at `value` within [lower, upper]. */
function tangentBounds(value: number, lower: number, upper: number, delta = 0): [number, number] {
  if (lower === upper) return [delta, delta];
  const tol = tolerance(lower, upper);
  const atLower = Number.isFinite(lower) && value - lower <= tol;
  const atUpper = Number.isFinite(upper) && upper - value <= tol;
  if (atLower && atUpper) return [delta, delta];
  if (atLower) return [delta, Infinity];
  if (atUpper) return [-Infinity, delta];
  return [-Infinity, Infinity];
}

/** Row activities A·x. */
function activities(lp: LpModel, x: Float64Array): Float64Array {
  const out = new Float64Array(lp.numRows);
  for (let i = 0; i < lp.numRows; i++) {
    let sum = 0;
    for (let k = lp.rowStarts[i]!; k < lp.rowStarts[i + 1]!; k++) sum += lp.values[k]! * x[lp.colIndex[k]!]!;
    out[i] = sum;
  }
  return out;
}

/** The tangent LP at x* for the right-hand-side change `rhsDelta` (length numRows). */
export function tangentLp(lp: LpModel, x: Float64Array, rhsDelta: Float64Array): LpModel {
  const colLower = new Float64Array(lp.numCols);
  const colUpper = new Float64Array(lp.numCols);
  for (let j = 0; j < lp.numCols; j++) {
    [colLower[j], colUpper[j]] = tangentBounds(x[j]!, lp.colLower[j]!, lp.colUpper[j]!);
  }
  const rowLower = new Float64Array(lp.numRows);
  const rowUpper = new Float64Array(lp.numRows);
  const ax = activities(lp, x);
  for (let i = 0; i < lp.numRows; i++) {
    // An inactive inequality row constrains no small change: it stays free whatever Δb is.
    [rowLower[i], rowUpper[i]] = tangentBounds(ax[i]!, lp.rowLower[i]!, lp.rowUpper[i]!, rhsDelta[i]);
  }
  const { colNames: _cols, rowNames: _rows, ...matrix } = lp;
  return { ...matrix, colLower, colUpper, rowLower, rowUpper, offset: 0 };
}
