/**
 * The dispatch LP of docs/model.md as plain data. Units: kW, kWh, hours; the
 * objective is in currency (price per MWh × kW × h / 1000).
 *
 * Per step t: charge c_t, discharge d_t, [grid import m_t, export x_t], energy e_{t+1}.
 *   soc_t:      e_{t+1} − a·e_t − η_ch·Δt·c_t + Δt/η_dis·d_t = 0   (a = 1 − σΔt; e_0 moves to the right side when fixed)
 *   balance_t:  m_t − x_t − c_t + d_t = L_t − G_t
 *   peak_t:     peak − m_t ≥ 0                                    (demand charge only)
 * Per local day k: Σ_{t in k} Δt·d_t ≤ n_cycles·E_usable           (throughput cap only)
 * When the grid needs no variables (one price, no limits, no demand charge) m − x is
 * substituted: the price moves onto c and d and p·(L − G)·Δt/1000 becomes the offset.
 */
import type { BatteryParams, DispatchProblem } from '../types';
import { CsrWriter } from '../lp/csr-writer';
import type { LpModel } from '../lp/lp-model';
import { dispatchLayout, sameMatrix, type DispatchLayout } from './dispatch-layout';
import { LimitModelWriter, limitStepNames } from '../limits/limit-model';

export interface DispatchModel {
  readonly lp: LpModel;
  readonly layout: DispatchLayout;
  /** The problem it was built from (to tell whether a later window can share the matrix). */
  readonly problem: DispatchProblem;
}

export interface BuildOptions {
  /** Give columns and rows readable names (slower; for LP text and debugging). */
  readonly names?: boolean;
  /** A model of an earlier window: when its matrix is the same, it is shared instead of rebuilt. */
  readonly previous?: DispatchModel;
}

/** SoC window in kWh. */
export function energyBounds(source: { readonly battery: BatteryParams }): { min: number; max: number } {
  const { energyKwh, socMinPct, socMaxPct } = source.battery;
  return { min: (energyKwh * socMinPct) / 100, max: (energyKwh * socMaxPct) / 100 };
}

function terminalBounds(problem: DispatchProblem, min: number, max: number): [number, number] {
  const rule = problem.terminal;
  if (rule.kind === 'cyclic' && !problem.freeInitialEnergy) return [problem.initialEnergyKwh, problem.initialEnergyKwh];
  if (rule.kind === 'target') return [Math.max(min, (problem.battery.energyKwh * rule.socPct) / 100), max];
  return [min, max];
}

function stepNames(layout: DispatchLayout): { cols: string[]; rows: string[] } {
  const cols: string[] = [];
  const rows: string[] = [];
  for (let t = 0; t < layout.steps; t++) {
    const limits = limitStepNames(layout.limits, t);
    cols.push(`c${t}`, `d${t}`, ...(layout.hasGrid ? [`m${t}`, `x${t}`] : []), ...limits.cols, `e${t + 1}`);
    rows.push(`soc${t}`, ...(layout.hasGrid ? [`bal${t}`] : []), ...(layout.peakRow >= 0 ? [`pk${t}`] : []), ...limits.rows);
  }
  if (layout.initialEnergyCol >= 0) cols.push('e0');
  if (layout.peakCol >= 0) cols.push('peak');
  for (const day of layout.capDays) rows.push(`cap${day}`);
  if (layout.cyclicRow >= 0) rows.push('cyclic');
  return { cols, rows };
}

export function buildDispatchModel(problem: DispatchProblem, options: BuildOptions = {}): DispatchModel {
  const layout = dispatchLayout(problem);
  const { battery, site, stepHours: dt } = problem;
  const { min: eMin, max: eMax } = energyBounds(problem);
  const n = layout.steps;
  const k = layout.colsPerStep;
  const a = 1 - (battery.selfDischargePctPerHour / 100) * dt;
  const chargeGain = battery.efficiencyCharge * dt;
  const dischargeLoss = dt / battery.efficiencyDischarge;
  const degradation = (battery.degradationCostPerMwh * dt) / 1000;
  const limits = LimitModelWriter.for(problem, layout, eMin, eMax);
  const nz =
    n * 4 +
    (layout.hasGrid ? n * 4 : 0) +
    (layout.peakCol >= 0 ? n * 2 : 0) +
    (layout.capDays.length ? n : 0) +
    (limits ? LimitModelWriter.nonZeros(layout) : 0) +
    3;
  const previous = options.previous;
  const shared = previous && sameMatrix(previous.problem, previous.layout, problem, layout) ? previous.lp : undefined;
  const w = new CsrWriter(layout.numCols, layout.numRows, nz, shared);
  let offset = 0;
  const [lastMin, lastMax] = terminalBounds(problem, eMin, eMax);
  const terminalValue = problem.terminal.kind === 'steady-value' ? problem.terminal.valuePerMwh / 1000 : 0;
  const e0 = problem.freeInitialEnergy ? 0 : problem.initialEnergyKwh;

  for (let t = 0; t < n; t++) {
    const base = t * k;
    const price = (problem.priceImport[t]! * dt) / 1000;
    const last = t === n - 1;
    // Availability scales both power ratings (DESIGN section 3.3).
    const available = problem.availability?.[t] ?? 1;
    const chargeMax = battery.powerChargeKw * available;
    const dischargeMax = battery.powerDischargeKw * available;
    if (layout.hasGrid) {
      w.setColumn(base, 0, 0, chargeMax);
      w.setColumn(base + 1, degradation, 0, dischargeMax);
      w.setColumn(base + 2, price, 0, site.importLimitKw ?? Infinity);
      w.setColumn(base + 3, (-problem.priceExport[t]! * dt) / 1000, 0, site.exportLimitKw ?? Infinity);
    } else {
      w.setColumn(base, price, 0, chargeMax);
      w.setColumn(base + 1, degradation - price, 0, dischargeMax);
      offset += price * (problem.loadKw[t]! - problem.generationKw[t]!);
    }
    w.setColumn(base + layout.energy, last ? -terminalValue : 0, last ? lastMin : eMin, last ? lastMax : eMax);
    limits?.setColumns(w, t);

    // soc_t, entries in column order
    const rhs = t === 0 && !problem.freeInitialEnergy ? a * e0 : 0;
    w.startRow(rhs, rhs);
    if (t > 0) w.add(base - k + layout.energy, -a);
    w.add(base, -chargeGain);
    w.add(base + 1, dischargeLoss);
    w.add(base + layout.energy, 1);
    if (t === 0 && layout.initialEnergyCol >= 0) w.add(layout.initialEnergyCol, -a);
    if (layout.hasGrid) {
      const net = problem.loadKw[t]! - problem.generationKw[t]!;
      w.startRow(net, net);
      w.add(base, -1);
      w.add(base + 1, 1);
      w.add(base + 2, 1);
      w.add(base + 3, -1);
    }
    if (layout.peakCol >= 0) {
      w.startRow(0, Infinity);
      w.add(base + 2, -1);
      w.add(layout.peakCol, 1);
    }
    limits?.writeRows(w, t, e0);
  }
  if (layout.initialEnergyCol >= 0) w.setColumn(layout.initialEnergyCol, 0, eMin, eMax);
  if (layout.peakCol >= 0) w.setColumn(layout.peakCol, site.demandChargePerKw!, problem.peakFloorKw ?? 0, Infinity);

  if (layout.capDays.length > 0) {
    const cap = battery.maxCyclesPerDay! * (eMax - eMin);
    let t = 0;
    layout.capDays.forEach((day, index) => {
      const used = index === 0 ? (problem.dischargedFirstDayKwh ?? 0) : 0;
      w.startRow(-Infinity, Math.max(0, cap - used));
      for (; t < n && problem.dayIndex[t] === day; t++) w.add(t * k + 1, dt);
    });
  }
  if (layout.cyclicRow >= 0) {
    w.startRow(0, 0);
    w.add((n - 1) * k + layout.energy, 1);
    w.add(layout.initialEnergyCol, -1);
  }
  const lp = w.finish(offset, options.names ? stepNames(layout) : undefined);
  return { lp, layout, problem };
}
