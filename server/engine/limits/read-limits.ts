/**
 * What the operating limits did to a solved schedule: the reserve held, its
 * revenue, the switching penalty, and how often each limit binds. Read from the
 * schedule itself (not the solver's auxiliary columns), so the figures mean the
 * same whichever optimal schedule the tie-break kept.
 */
import type { DispatchProblem, LimitBinding } from '../types';
import type { DispatchModel } from '../model/build-dispatch-model';
import { energyBounds } from '../model/build-dispatch-model';
import { hasLimits, limitFeatures } from './limit-features';

export interface LimitReadout {
  readonly reserveUpKw?: number[];
  readonly reserveDownKw?: number[];
  readonly reserveRevenue?: number;
  readonly switchingPenalty?: number;
  readonly limitBinding?: LimitBinding;
}

interface Schedule {
  readonly chargeKw: readonly number[];
  readonly dischargeKw: readonly number[];
  readonly gridImportKw: readonly number[];
  readonly gridExportKw: readonly number[];
  readonly socKwh: readonly number[];
}

/** Reserve revenue (currency) of held reserve over steps [from, to): Σ (ρ↑·r↑ + ρ↓·r↓)·Δt/1000. */
export function reserveRevenue(
  problem: Pick<DispatchProblem, 'stepHours' | 'reserveUpPrice' | 'reserveDownPrice'>,
  up: readonly number[] | undefined,
  down: readonly number[] | undefined,
  from = 0,
  to = up?.length ?? down?.length ?? 0,
): number {
  let sum = 0;
  for (let t = from; t < to; t++) {
    sum += (problem.reserveUpPrice?.[t] ?? 0) * (up?.[t] ?? 0) + (problem.reserveDownPrice?.[t] ?? 0) * (down?.[t] ?? 0);
  }
  return (sum * problem.stepHours) / 1000;
}

/** s·Σ|Δ net power|/1000 over steps [from, to), counting step 0 only when the power before it is known. */
export function switchingPenalty(
  problem: Pick<DispatchProblem, 'battery' | 'initialNetPowerKw'>,
  schedule: Pick<Schedule, 'chargeKw' | 'dischargeKw'>,
  from = 0,
  to = schedule.chargeKw.length,
): number {
  const s = problem.battery.switchingCostPerMw ?? 0;
  if (s === 0) return 0;
  let moved = 0;
  for (let t = Math.max(from, 0); t < to; t++) {
    const p = schedule.dischargeKw[t]! - schedule.chargeKw[t]!;
    const before = t > 0 ? schedule.dischargeKw[t - 1]! - schedule.chargeKw[t - 1]! : problem.initialNetPowerKw;
    if (before !== undefined) moved += Math.abs(p - before);
  }
  return (s * moved) / 1000;
}

function readReserve(model: DispatchModel, x: Float64Array, offset: number): number[] {
  const { layout } = model;
  const out: number[] = [];
  for (let t = 0; t < layout.steps; t++) out.push(Math.max(0, x[t * layout.colsPerStep + offset]!));
  return out;
}

/** The limit figures of an LP solution, or {} when the problem has none of the limits. */
export function readLimits(problem: DispatchProblem, model: DispatchModel, x: Float64Array, schedule: Schedule): LimitReadout {
  const L = model.layout.limits;
  const up = L.reserveUp >= 0 ? readReserve(model, x, L.reserveUp) : undefined;
  const down = L.reserveDown >= 0 ? readReserve(model, x, L.reserveDown) : undefined;
  return limitReadout(problem, schedule, up, down);
}

/** The limit figures of a schedule with the reserve it holds (none on the DP path), or {} without limits. */
export function limitReadout(
  problem: DispatchProblem,
  schedule: Schedule,
  up: number[] | undefined,
  down: number[] | undefined,
): LimitReadout {
  const f = limitFeatures(problem);
  if (!hasLimits(f)) return {};
  return {
    ...(up && down ? { reserveUpKw: up, reserveDownKw: down, reserveRevenue: reserveRevenue(problem, up, down) } : {}),
    ...(f.switchingCostPerMw !== null ? { switchingPenalty: switchingPenalty(problem, schedule) } : {}),
    limitBinding: limitBinding(problem, schedule, up, down),
  };
}

/** Counts of intervals where each limit of DESIGN section 3.3 is met with equality (to 1e-6 of the ratings). */
export function limitBinding(
  problem: DispatchProblem,
  s: Schedule,
  up: readonly number[] | undefined,
  down: readonly number[] | undefined,
): LimitBinding {
  const b = problem.battery;
  const n = s.chargeKw.length;
  const tolKw = 1e-6 * Math.max(1, b.powerChargeKw, b.powerDischargeKw);
  const tolKwh = 1e-6 * Math.max(1, b.energyKwh);
  const { min, max } = energyBounds(problem);
  const ramp = b.rampKwPerMin != null ? b.rampKwPerMin * 60 * problem.stepHours : null;
  const D = problem.reserveHours ?? 0;
  const counts = { ramp: 0, availability: 0, power: 0, energy: 0, grid: 0, sign: 0 };
  for (let t = 0; t < n; t++) {
    const p = s.dischargeKw[t]! - s.chargeKw[t]!;
    const before = t > 0 ? s.dischargeKw[t - 1]! - s.chargeKw[t - 1]! : problem.initialNetPowerKw;
    if (ramp !== null && before !== undefined && Math.abs(p - before) >= ramp - tolKw) counts.ramp++;
    if (t > 0 && Math.abs(p) > tolKw && Math.abs(before!) > tolKw && Math.sign(p) !== Math.sign(before!)) counts.sign++;
    const a = problem.availability?.[t] ?? 1;
    const [ru, rd] = [up?.[t] ?? 0, down?.[t] ?? 0];
    const upFull = p + ru >= a * b.powerDischargeKw - tolKw;
    const downFull = -p + rd >= a * b.powerChargeKw - tolKw;
    if (a < 1 && (upFull || downFull)) counts.availability++;
    if ((ru > tolKw && upFull) || (rd > tolKw && downFull)) counts.power++;
    const [e0, e1] = [s.socKwh[t]!, s.socKwh[t + 1]!];
    const lowest = Math.min(e0, e1) - (ru * D) / b.efficiencyDischarge;
    const highest = Math.max(e0, e1) + rd * D * b.efficiencyCharge;
    if ((ru > tolKw && lowest <= min + tolKwh) || (rd > tolKw && highest >= max - tolKwh)) counts.energy++;
    const net = s.gridExportKw[t]! - s.gridImportKw[t]!;
    const { exportLimitKw: X, importLimitKw: M } = problem.site;
    if ((ru > tolKw && X !== null && net + ru >= X - tolKw) || (rd > tolKw && M !== null && -net + rd >= M - tolKw))
      counts.grid++;
  }
  return {
    rampIntervals: counts.ramp,
    availabilityIntervals: counts.availability,
    reservePowerIntervals: counts.power,
    reserveEnergyIntervals: counts.energy,
    reserveGridIntervals: counts.grid,
    signChanges: counts.sign,
  };
}
