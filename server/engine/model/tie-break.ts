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
import type { LpModel, LpResult } from '../lp/lp-model';
import { reducedCosts } from '../lp/lp-model';
import { CsrWriter } from '../lp/csr-writer';
import type { DispatchModel } from './build-dispatch-model';

const REDUCED_COST_TOL = 1e-9;
/** HiGHS basis status codes (highs.constants.basisStatus). */
const highsBasisStatus = { basic: 1 } as const;
const MID_WEIGHT = 1e-4;

function atBound(value: number, lower: number, upper: number): boolean {
  return Math.abs(value - lower) <= 1e-7 * (1 + Math.abs(lower)) || Math.abs(value - upper) <= 1e-7 * (1 + Math.abs(upper));
}

/**
 * Columns whose move would change the schedule. Grid import/export at zero are
 * left out: at equal import and export prices they tie with each other (import
 * and export more at once), which netting removes after the solve; at a grid
 * limit they stay in.
 */
function decisionColumns(model: DispatchModel, x: Float64Array): number[] {
  const { layout, lp } = model;
  const cols: number[] = [];
  for (let t = 0; t < layout.steps; t++) {
    const base = t * layout.colsPerStep;
    cols.push(base + layout.charge, base + layout.discharge);
    for (const o of [layout.gridImport, layout.gridExport]) {
      if (o >= 0 && x[base + o]! > 1e-7 * (1 + lp.colUpper[base + o]!)) cols.push(base + o);
    }
  }
  if (layout.initialEnergyCol >= 0) cols.push(layout.initialEnergyCol);
  if (layout.peakCol >= 0) cols.push(layout.peakCol);
  return cols;
}

/**
 * Whether stage 1 may have picked one of several optimal schedules: a decision
 * column that is nonbasic with a zero reduced cost (dual degeneracy). With a HiGHS
 * basis the test is exact. GLPK (small models only) returns no basis, so there a
 * column at a bound with a zero reduced cost counts too; that also fires on primal
 * degeneracy (a basic column sitting at its bound), which costs only a needless
 * small second solve.
 */
export function mayHaveTies(model: DispatchModel, stage1: LpResult): boolean {
  const { lp } = model;
  const d = reducedCosts(lp, stage1.rowDual);
  const basic = highsBasisStatus.basic;
  const columns = decisionColumns(model, stage1.x);
  if (stage1.basis) {
    const status = stage1.basis.colStatus;
    return columns.some((j) => status[j] !== basic && Math.abs(d[j]!) <= REDUCED_COST_TOL);
  }
  const flat = columns.some((j) => Math.abs(d[j]!) <= REDUCED_COST_TOL && atBound(stage1.x[j]!, lp.colLower[j]!, lp.colUpper[j]!));
  // A free start (steady cycle) with a flat value of energy leaves the level itself open.
  return flat || (model.layout.initialEnergyCol >= 0 && Math.abs(d[model.layout.initialEnergyCol]!) <= REDUCED_COST_TOL);
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
