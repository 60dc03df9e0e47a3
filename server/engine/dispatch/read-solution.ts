/**
 * Turns an optimal LP result back into the series of a DispatchSolution.
 * Values are clipped to their bounds (solvers return them within ~1e-7), grid
 * import and export at the same step are netted when that cannot cost more, and
 * the stored-energy value is λ_t = −1000·y_t for the dual y_t of the SoC row of
 * e_{t+1}: y_t is the change of the optimal cost per extra kWh on that row's
 * right-hand side, i.e. per kWh handed to the battery for free at the end of
 * step t, so −y_t is the value of stored energy per kWh, ×1000 per MWh.
 */
import type { DispatchProblem, DispatchSolution, PowerSeries, ScheduleSeriesBuilder } from '../types';
import type { LpResult } from '../lp/lp-model';
import type { DispatchModel } from '../model/build-dispatch-model';
import { scheduleCost } from './schedule-cost';
import { readLimits } from '../limits/read-limits';

const clip = (v: number, lo: number, hi: number) => (v < lo ? lo : v > hi ? hi : v);

export function readSeries(problem: DispatchProblem, model: DispatchModel, x: Float64Array): ScheduleSeriesBuilder {
  const { layout, lp } = model;
  const n = layout.steps;
  const out: ScheduleSeriesBuilder = {
    chargeKw: new Array<number>(n),
    dischargeKw: new Array<number>(n),
    gridImportKw: new Array<number>(n),
    gridExportKw: new Array<number>(n),
    socKwh: new Array<number>(n + 1),
  };
  const free = layout.initialEnergyCol;
  out.socKwh[0] = free >= 0 ? clip(x[free]!, lp.colLower[free]!, lp.colUpper[free]!) : problem.initialEnergyKwh;
  const { powerChargeKw, powerDischargeKw } = problem.battery;
  for (let t = 0; t < n; t++) {
    const base = t * layout.colsPerStep;
    const c = clip(x[base + layout.charge]!, 0, powerChargeKw);
    const d = clip(x[base + layout.discharge]!, 0, powerDischargeKw);
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
      const net = problem.loadKw[t]! - problem.generationKw[t]! + c - d;
      m = net > 0 ? net : 0;
      xp = net < 0 ? -net : 0;
    }
    const e = base + layout.energy;
    out.chargeKw[t] = c;
    out.dischargeKw[t] = d;
    out.gridImportKw[t] = m;
    out.gridExportKw[t] = xp;
    out.socKwh[t + 1] = clip(x[e]!, lp.colLower[e]!, lp.colUpper[e]!);
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
export function simultaneousSteps(problem: DispatchProblem, series: PowerSeries): number[] {
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
  let peak = 0;
  for (const m of series.gridImportKw) if (m > peak) peak = m;
  const costInputs = {
    stepHours: problem.stepHours,
    priceImport: problem.priceImport,
    priceExport: problem.priceExport,
    degradationCostPerMwh: problem.battery.degradationCostPerMwh,
    demandChargePerKw: problem.site.demandChargePerKw,
  };
  const limits = readLimits(problem, model, finalX, series);
  return {
    status: 'optimal',
    method: 'lp',
    objective: stage1.objective,
    cost: scheduleCost(costInputs, series) - (limits.reserveRevenue ?? 0),
    ...series,
    ...limits,
    storedEnergyValue: storedEnergyValues(model, stage1.rowDual),
    peakImportKw: peak,
    simultaneousSteps: simultaneousSteps(problem, series),
    backend: stage1.backend,
    tieBroken: extra.tieBroken,
    seconds: extra.seconds,
  };
}
