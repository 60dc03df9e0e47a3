/**
 * Turns an optimal LP result back into the series of a DispatchSolution.
 * Values are clipped to their bounds (solvers return them within ~1e-7), grid
 * import and export at the same step are netted when that cannot cost more, and
 * the stored-energy value is λ_t = −1000·y_t for the dual y_t of the SoC row of
 * e_{t+1}: y_t is the change of the optimal cost per extra kWh on that row's
 * right-hand side, i.e. per kWh handed to the battery for free at the end of
 * step t, so −y_t is the value of stored energy per kWh, ×1000 per MWh.
 */
import type { DispatchProblem, DispatchSolution } from '../types';
import type { LpResult } from '../lp/lp-model';
import type { DispatchModel } from '../model/build-dispatch-model';
import { gridFlows, scheduleCost } from './schedule-cost';

const clip = (v: number, lo: number, hi: number) => (v < lo ? lo : v > hi ? hi : v);

export interface SolutionSeries {
  chargeKw: number[];
  dischargeKw: number[];
  gridImportKw: number[];
  gridExportKw: number[];
  socKwh: number[];
}

export function readSeries(problem: DispatchProblem, model: DispatchModel, x: Float64Array): SolutionSeries {
  const { layout, lp } = model;
  const n = layout.steps;
  const out: SolutionSeries = { chargeKw: [], dischargeKw: [], gridImportKw: [], gridExportKw: [], socKwh: [] };
  const e0 = layout.initialEnergyCol >= 0 ? x[layout.initialEnergyCol]! : problem.initialEnergyKwh;
  out.socKwh.push(layout.initialEnergyCol >= 0 ? clip(e0, lp.colLower[layout.initialEnergyCol]!, lp.colUpper[layout.initialEnergyCol]!) : e0);
  for (let t = 0; t < n; t++) {
    const base = t * layout.colsPerStep;
    const c = clip(x[base + layout.charge]!, 0, problem.battery.powerChargeKw);
    const d = clip(x[base + layout.discharge]!, 0, problem.battery.powerDischargeKw);
    let m: number;
    let xp: number;
    if (layout.hasGrid) {
      m = clip(x[base + layout.gridImport]!, 0, lp.colUpper[base + layout.gridImport]!);
      xp = clip(x[base + layout.gridExport]!, 0, lp.colUpper[base + layout.gridExport]!);
      if (m > 0 && xp > 0 && problem.priceExport[t]! <= problem.priceImport[t]!) {
        const both = Math.min(m, xp);
        m -= both;
        xp -= both;
      }
    } else {
      [m, xp] = gridFlows(problem.loadKw[t]!, problem.generationKw[t]!, c, d);
    }
    const e = base + layout.energy;
    out.chargeKw.push(c);
    out.dischargeKw.push(d);
    out.gridImportKw.push(m);
    out.gridExportKw.push(xp);
    out.socKwh.push(clip(x[e]!, lp.colLower[e]!, lp.colUpper[e]!));
  }
  return out;
}

export function storedEnergyValues(model: DispatchModel, rowDual: Float64Array): number[] {
  const { layout } = model;
  const values: number[] = [];
  for (let t = 0; t < layout.steps; t++) values.push(-1000 * rowDual[t * layout.rowsPerStep + layout.socRow]! || 0);
  return values;
}

/** Steps with both charge and discharge above 1e-6 of the power rating. */
export function simultaneousSteps(problem: DispatchProblem, series: SolutionSeries): number[] {
  const tol = 1e-6 * Math.max(1, problem.battery.powerChargeKw, problem.battery.powerDischargeKw);
  const steps: number[] = [];
  for (let t = 0; t < series.chargeKw.length; t++) {
    if (series.chargeKw[t]! > tol && series.dischargeKw[t]! > tol) steps.push(t);
  }
  return steps;
}

export function toDispatchSolution(
  problem: DispatchProblem,
  model: DispatchModel,
  stage1: LpResult,
  finalX: Float64Array,
  extra: { tieBroken: boolean; seconds: number },
): DispatchSolution {
  const series = readSeries(problem, model, finalX);
  const peak = series.gridImportKw.reduce((p, m) => Math.max(p, m), 0);
  return {
    status: 'optimal',
    method: 'lp',
    objective: stage1.objective,
    cost: scheduleCost(
      { ...problem, degradationCostPerMwh: problem.battery.degradationCostPerMwh, demandChargePerKw: problem.site.demandChargePerKw },
      series,
    ),
    ...series,
    storedEnergyValue: storedEnergyValues(model, stage1.rowDual),
    peakImportKw: peak,
    simultaneousSteps: simultaneousSteps(problem, series),
    backend: stage1.backend,
    tieBroken: extra.tieBroken,
    seconds: extra.seconds,
  };
}
