/**
 * Tie-break rule for degenerate optima (several schedules with the same optimal
 * cost, common when prices are flat or repeat). Documented rule:
 *
 *   1. Solve the dispatch LP (stage 1): schedule x*, row duals y*.
 *   2. Only if some decision variable sits at a bound with a zero reduced cost
 *      (the sign that another optimal schedule may exist), solve again over the
 *      optimal face: every column whose reduced cost d = c − Aᵀy* is non-zero is
 *      fixed at the bound its sign demands, and every inequality row with a
 *      non-zero dual at its active bound. By complementary slackness these are
 *      exactly the optimal schedules. Among them minimise
 *         Σ_t Δt·(c_t + d_t)  +  1e-4·Σ_t |e_{t+1} − e_mid|
 *      i.e. the least throughput, then the SoC nearest the middle of its window.
 *
 * No cost slack is needed, so the cost stays optimal to solver precision. The
 * stored-energy values come from stage 1: any optimal dual is complementary to
 * every optimal primal, so they remain valid for the stage-2 schedule.
 */
import type { LpBasis, LpModel, LpResult } from '../lp/lp-model';
import { reducedCosts } from '../lp/lp-model';
import { CsrWriter } from '../lp/csr-writer';
import type { DispatchModel } from './build-dispatch-model';

const REDUCED_COST_TOL = 1e-9;
/** HiGHS basis status codes (highs.constants.basisStatus). */
const highsBasisStatus = { lower: 0, basic: 1 } as const;
const MID_WEIGHT = 1e-4;

function atBound(value: number, lower: number, upper: number): boolean {
  return Math.abs(value - lower) <= 1e-7 * (1 + Math.abs(lower)) || Math.abs(value - upper) <= 1e-7 * (1 + Math.abs(upper));
}

/**
 * Whether column j suggests another optimal schedule: a zero reduced cost and,
 * with a HiGHS basis, nonbasic (dual degeneracy, exact); without one (GLPK,
 * small models only) at a bound, which also fires on primal degeneracy and then
 * costs only a needless small second solve.
 */
function flat(j: number, d: Float64Array, stage1: LpResult, lp: LpModel): boolean {
  if (Math.abs(d[j]!) > REDUCED_COST_TOL) return false;
  const status = stage1.basis?.colStatus;
  return status ? status[j] !== highsBasisStatus.basic : atBound(stage1.x[j]!, lp.colLower[j]!, lp.colUpper[j]!);
}

/**
 * Whether stage 1 may have picked one of several optimal schedules. Only columns
 * whose move changes the schedule count: charge and discharge, the peak, a free
 * start, and grid import/export away from zero (at zero, equal import and export
 * prices tie them with each other, which netting after the solve removes).
 */
export function mayHaveTies(model: DispatchModel, stage1: LpResult): boolean {
  const { lp, layout } = model;
  const d = reducedCosts(lp, stage1.rowDual);
  for (let t = 0; t < layout.steps; t++) {
    const base = t * layout.colsPerStep;
    if (flat(base + layout.charge, d, stage1, lp) || flat(base + layout.discharge, d, stage1, lp)) return true;
    for (const o of [layout.gridImport, layout.gridExport]) {
      if (o >= 0 && stage1.x[base + o]! > 1e-7 * (1 + lp.colUpper[base + o]!) && flat(base + o, d, stage1, lp)) return true;
    }
  }
  if (layout.peakCol >= 0 && flat(layout.peakCol, d, stage1, lp)) return true;
  // A free start (steady cycle) with a flat value of energy leaves the level itself open.
  return layout.initialEnergyCol >= 0 && Math.abs(d[layout.initialEnergyCol]!) <= REDUCED_COST_TOL;
}

function fixedBounds(lower: number, upper: number, sign: number): [number, number] {
  if (sign > 0 && Number.isFinite(lower)) return [lower, lower];
  if (sign < 0 && Number.isFinite(upper)) return [upper, upper];
  return [lower, upper];
}

const signOf = (v: number) => (v > REDUCED_COST_TOL ? 1 : v < -REDUCED_COST_TOL ? -1 : 0);

export function buildTieBreakModel(model: DispatchModel, stage1: LpResult, stepHours: number, midEnergyKwh: number): LpModel {
  const { lp, layout } = model;
  const n = layout.steps;
  const d = reducedCosts(lp, stage1.rowDual);
  const w = new CsrWriter(lp.numCols + n, lp.numRows + 2 * n, lp.values.length + 4 * n);
  for (let j = 0; j < lp.numCols; j++) w.setColumn(j, 0, ...fixedBounds(lp.colLower[j]!, lp.colUpper[j]!, signOf(d[j]!)));
  for (let t = 0; t < n; t++) {
    const base = t * layout.colsPerStep;
    w.colCost[base + layout.charge] = stepHours;
    w.colCost[base + layout.discharge] = stepHours;
    w.setColumn(lp.numCols + t, MID_WEIGHT, 0, Infinity);
  }
  for (let i = 0; i < lp.numRows; i++) {
    w.startRow(...fixedBounds(lp.rowLower[i]!, lp.rowUpper[i]!, signOf(stage1.rowDual[i]!)));
    for (let k = lp.rowStarts[i]!; k < lp.rowStarts[i + 1]!; k++) w.add(lp.colIndex[k]!, lp.values[k]!);
  }
  for (let t = 0; t < n; t++) {
    const e = t * layout.colsPerStep + layout.energy;
    const u = lp.numCols + t;
    // u_t ≥ e − mid and u_t ≥ mid − e, entries in column order (e < u)
    w.startRow(-midEnergyKwh, Infinity);
    w.add(e, -1);
    w.add(u, 1);
    w.startRow(midEnergyKwh, Infinity);
    w.add(e, 1);
    w.add(u, 1);
  }
  return w.finish(0);
}

/**
 * A starting basis for the stage-2 model from stage 1's (HiGHS): the stage-1
 * schedule is feasible for stage 2, so stage 2 starts from it instead of from
 * scratch (on the year-long LP a cold stage 2 cost as much as stage 1). Each
 * |e − mid| column is basic, with the row of the side it measures active.
 */
export function tieBreakWarmBasis(model: DispatchModel, stage1: LpResult, midEnergyKwh: number): LpBasis | undefined {
  const basis = stage1.basis;
  if (!basis) return undefined;
  const { lp, layout } = model;
  const n = layout.steps;
  const colStatus = new Int32Array(lp.numCols + n);
  colStatus.set(basis.colStatus);
  colStatus.fill(highsBasisStatus.basic, lp.numCols);
  const rowStatus = new Int32Array(lp.numRows + 2 * n);
  rowStatus.set(basis.rowStatus);
  for (let t = 0; t < n; t++) {
    const above = stage1.x[t * layout.colsPerStep + layout.energy]! >= midEnergyKwh;
    rowStatus[lp.numRows + 2 * t] = above ? highsBasisStatus.lower : highsBasisStatus.basic;
    rowStatus[lp.numRows + 2 * t + 1] = above ? highsBasisStatus.basic : highsBasisStatus.lower;
  }
  return { colStatus, rowStatus };
}
