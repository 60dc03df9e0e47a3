/**
 * The constraint groups of DESIGN section 3.3 in the dispatch LP, written step
 * by step into the model builder's CsrWriter after the step's own rows. Units:
 * kW, kWh, hours; reserve prices currency/MW/h, switching cost currency/MW.
 *
 * Per step t, with a = a_t, D = reserveHours, p_t = d_t − c_t:
 *   power↑:   d − c + r↑ ≤ a·P_dis            power↓:   c − d + r↓ ≤ a·P_ch
 *   energy↑:  e_{t+1} − r↑·D/η_dis ≥ E_min    energy↓:  e_{t+1} + r↓·D·η_ch ≤ E_max
 *   (and the same two rows at e_t, the start of the step; e_0 moves to the bounds when fixed)
 *   grid↑:    x − m + r↑ ≤ X_max (export limit)  grid↓: m − x + r↓ ≤ M_max (import limit)
 *   move:     p_t − p_{t−1} − s⁺ + s⁻ = 0,  0 ≤ s± ≤ R·60·Δt (ramp), cost s·(s⁺ + s⁻)/1000
 * At t = 0 the move row uses the given initial net power, or is free with s± = 0
 * when none is given (nothing is known before t = 0). The availability a_t also
 * scales the charge and discharge bounds, which the model builder sets.
 */
import type { DispatchProblem } from '../types';
import type { CsrWriter } from '../lp/csr-writer';
import type { DispatchLayout } from '../model/dispatch-layout';
import { hasMoves, hasReserves, limitFeatures } from './limit-features';
import type { LimitLayout } from './limit-layout';

/** Readable names of step t's limit columns and rows, in layout order (LP text, debugging). */
export function limitStepNames(L: LimitLayout, t: number): { cols: string[]; rows: string[] } {
  const cols: string[] = [];
  const rows: string[] = [];
  if (L.reserveUp >= 0) cols.push(`rup${t}`, `rdn${t}`);
  if (L.moveUp >= 0) cols.push(`mvup${t}`, `mvdn${t}`);
  if (L.powerUpRow >= 0) rows.push(`pwup${t}`, `pwdn${t}`, `enup${t}`, `endn${t}`, `stup${t}`, `stdn${t}`);
  if (L.gridUpRow >= 0) rows.push(`gdup${t}`);
  if (L.gridDownRow >= 0) rows.push(`gddn${t}`);
  if (L.moveRow >= 0) rows.push(`move${t}`);
  return { cols, rows };
}

export class LimitModelWriter {
  private readonly k: number;
  private readonly upCost: number;
  private readonly headUp: number;
  private readonly headDown: number;
  private readonly rampKw: number;
  private readonly switchCost: number;

  private constructor(
    private readonly problem: DispatchProblem,
    private readonly layout: DispatchLayout,
    private readonly eMin: number,
    private readonly eMax: number,
  ) {
    const f = limitFeatures(problem);
    const { battery, stepHours: dt } = problem;
    const hours = problem.reserveHours ?? 0;
    this.k = layout.colsPerStep;
    this.upCost = dt / 1000;
    this.headUp = hours / battery.efficiencyDischarge;
    this.headDown = hours * battery.efficiencyCharge;
    this.rampKw = f.rampKwPerMin !== null ? f.rampKwPerMin * 60 * dt : Infinity;
    this.switchCost = (f.switchingCostPerMw ?? 0) / 1000;
  }

  /** A writer when the problem has reserves, a ramp rate or a switching cost; null otherwise. */
  static for(problem: DispatchProblem, layout: DispatchLayout, eMin: number, eMax: number): LimitModelWriter | null {
    const f = limitFeatures(problem);
    return hasReserves(f) || hasMoves(f) ? new LimitModelWriter(problem, layout, eMin, eMax) : null;
  }

  /** Non-zeros the limit rows add (an upper bound, for the writer's arrays). */
  static nonZeros(layout: DispatchLayout): number {
    const L = layout.limits;
    const perRow = [
      [L.powerUpRow, 3],
      [L.powerDownRow, 3],
      [L.energyUpEndRow, 2],
      [L.energyDownEndRow, 2],
      [L.energyUpStartRow, 2],
      [L.energyDownStartRow, 2],
      [L.gridUpRow, 3],
      [L.gridDownRow, 3],
      [L.moveRow, 6],
    ] as const;
    return layout.steps * perRow.reduce((sum, [row, nz]) => sum + (row >= 0 ? nz : 0), 0);
  }

  /** Costs and bounds of step t's limit columns. */
  setColumns(w: CsrWriter, t: number): void {
    const L = this.layout.limits;
    const base = t * this.k;
    const p = this.problem;
    if (L.reserveUp >= 0) {
      const up = p.reserveUpPrice;
      w.setColumn(base + L.reserveUp, up ? -up[t]! * this.upCost : 0, 0, up ? Infinity : 0);
      const down = p.reserveDownPrice;
      w.setColumn(base + L.reserveDown, down ? -down[t]! * this.upCost : 0, 0, down ? Infinity : 0);
    }
    if (L.moveUp >= 0) {
      const open = t > 0 || p.initialNetPowerKw !== undefined;
      const bound = open ? this.rampKw : 0;
      w.setColumn(base + L.moveUp, this.switchCost, 0, bound);
      w.setColumn(base + L.moveDown, this.switchCost, 0, bound);
    }
  }

  /** Step t's limit rows, in the layout's row order, entries in column order. */
  writeRows(w: CsrWriter, t: number, e0: number): void {
    const L = this.layout.limits;
    const { charge, discharge, gridImport, gridExport, energy } = this.layout;
    const base = t * this.k;
    const [c, d, m, x, e] = [base + charge, base + discharge, base + gridImport, base + gridExport, base + energy];
    const [rUp, rDown] = [base + L.reserveUp, base + L.reserveDown];
    const { battery } = this.problem;
    const a = this.problem.availability?.[t] ?? 1;
    if (L.powerUpRow >= 0) {
      w.startRow(-Infinity, a * battery.powerDischargeKw);
      w.add(c, -1);
      w.add(d, 1);
      w.add(rUp, 1);
      w.startRow(-Infinity, a * battery.powerChargeKw);
      w.add(c, 1);
      w.add(d, -1);
      w.add(rDown, 1);
      w.startRow(this.eMin, Infinity);
      w.add(rUp, -this.headUp);
      w.add(e, 1);
      w.startRow(-Infinity, this.eMax);
      w.add(rDown, this.headDown);
      w.add(e, 1);
      this.startHeadroom(w, t, rUp, -this.headUp, this.eMin, Infinity, e0);
      this.startHeadroom(w, t, rDown, this.headDown, -Infinity, this.eMax, e0);
      if (L.gridUpRow >= 0) {
        w.startRow(-Infinity, this.problem.site.exportLimitKw!);
        w.add(m, -1);
        w.add(x, 1);
        w.add(rUp, 1);
      }
      if (L.gridDownRow >= 0) {
        w.startRow(-Infinity, this.problem.site.importLimitKw!);
        w.add(m, 1);
        w.add(x, -1);
        w.add(rDown, 1);
      }
    }
    if (L.moveRow >= 0) {
      const given = this.problem.initialNetPowerKw;
      if (t > 0) w.startRow(0, 0);
      else if (given !== undefined) w.startRow(given, given);
      else w.startRow(-Infinity, Infinity);
      if (t > 0) {
        w.add(c - this.k, 1);
        w.add(d - this.k, -1);
      }
      w.add(c, -1);
      w.add(d, 1);
      w.add(base + L.moveUp, -1);
      w.add(base + L.moveDown, 1);
    }
  }

  /** e_t + coef·r within [lo, hi]; e_0 is a constant (moved to the bounds) unless the start is free. */
  private startHeadroom(w: CsrWriter, t: number, r: number, coef: number, lo: number, hi: number, e0: number): void {
    const { energy, initialEnergyCol } = this.layout;
    if (t > 0) {
      w.startRow(lo, hi);
      w.add((t - 1) * this.k + energy, 1);
      w.add(r, coef);
    } else if (initialEnergyCol >= 0) {
      w.startRow(lo, hi);
      w.add(r, coef);
      w.add(initialEnergyCol, 1);
    } else {
      w.startRow(lo - e0, hi - e0);
      w.add(r, coef);
    }
  }
}
