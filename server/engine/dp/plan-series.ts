import type { DispatchProblem } from '../types';
import type { DpSolution } from './solve';
import type { WindowSolver } from './window-solver';

/** Per-step series of a plan or a realized closed-loop run, indexed from 0. */
export class PlanSeries {
  readonly c: Float64Array;
  readonly d: Float64Array;
  readonly m: Float64Array;
  readonly x: Float64Array;
  /** Energy at the end of each step (kWh). */
  readonly y: Float64Array;
  readonly value: Float64Array;
  readonly rangeLo: Float64Array;
  readonly rangeHi: Float64Array;

  constructor(readonly length: number) {
    this.c = new Float64Array(length);
    this.d = new Float64Array(length);
    this.m = new Float64Array(length);
    this.x = new Float64Array(length);
    this.y = new Float64Array(length);
    this.value = new Float64Array(length);
    this.rangeLo = new Float64Array(length);
    this.rangeHi = new Float64Array(length);
  }

  /** Copies the solver's decisions for steps [from, to) to positions from − shift onwards. */
  copyFrom(solver: WindowSolver, from: number, to: number, shift: number): void {
    const plan = solver.plan;
    const { c, d, y, value } = this;
    let r = solver.ringIndex(from);
    const size = plan.tTag.length;
    for (let t = from; t < to; t++) {
      const i = t - shift;
      c[i] = plan.c[r] ?? 0;
      d[i] = plan.d[r] ?? 0;
      y[i] = plan.y[r] ?? 0;
      value[i] = plan.value[r] ?? 0;
      this.m[i] = plan.m[r] ?? 0;
      this.x[i] = plan.x[r] ?? 0;
      this.rangeLo[i] = plan.rangeLo[r] ?? 0;
      this.rangeHi[i] = plan.rangeHi[r] ?? 0;
      r = r + 1 === size ? 0 : r + 1;
    }
  }

  /**
   * The DispatchSolution of the steps [first, first + length) of the problem:
   * cost = Σ (π_imp·m − π_exp·x + c_deg·d)·Δt/1000, exactly the LP's objective
   * terms (objective is set to the cost; callers subtract terminal values).
   */
  toSolution(p: DispatchProblem, first: number, e0: number, intervals: boolean): DpSolution & { objective: number } {
    const n = this.length;
    const scale = p.stepHours / 1000;
    const deg = p.battery.degradationCostPerMwh;
    const socKwh = [e0];
    const simultaneousSteps: number[] = [];
    // Same threshold as the LP path: both flows above 1e-6 of the larger power rating.
    const tolP = 1e-6 * Math.max(1, p.battery.powerChargeKw, p.battery.powerDischargeKw);
    let cost = 0;
    let peak = 0;
    for (let i = 0; i < n; i++) {
      const t = first + i;
      const m = this.m[i] ?? 0;
      cost += ((p.priceImport[t] ?? 0) * m - (p.priceExport[t] ?? 0) * (this.x[i] ?? 0) + deg * (this.d[i] ?? 0)) * scale;
      if (m > peak) peak = m;
      socKwh.push(this.y[i] ?? 0);
      if ((this.c[i] ?? 0) > tolP && (this.d[i] ?? 0) > tolP) simultaneousSteps.push(t);
    }
    return {
      status: 'optimal',
      method: 'dp',
      objective: cost,
      cost,
      chargeKw: toArray(this.c),
      dischargeKw: toArray(this.d),
      gridImportKw: toArray(this.m),
      gridExportKw: toArray(this.x),
      socKwh,
      storedEnergyValue: toArray(this.value),
      peakImportKw: peak,
      simultaneousSteps,
      ...(intervals ? { storedEnergyValueRange: { low: toArray(this.rangeLo), high: toArray(this.rangeHi) } } : {}),
    };
  }
}

/** A plain array copy (Array.from on typed arrays is several times slower in V8). */
function toArray(a: Float64Array): number[] {
  const out: number[] = [];
  for (let i = 0; i < a.length; i++) out.push(a[i] ?? 0);
  return out;
}
