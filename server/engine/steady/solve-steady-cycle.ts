/**
 * The steady cycle: the optimal periodic day for the representative day, solved
 * with e_N = e_0 and e_0 free (docs/model.md). With flat prices it reduces to
 * the optimal steady state (no trade, SoC mid-window by the tie-break rule).
 * A demand charge applies to the period's peak, so one representative day
 * carries 1/days of it.
 */
import type { DispatchProblem, SolveStatus } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import type { InputIssue } from '../model/validate-battery';
import { usableEnergyKwh } from '../inputs/problem-for';
import { solveDispatchLp } from '../dispatch/solve-dispatch-lp';
import { steadyValueIntervals, type ValueIntervals } from './value-intervals';
import { clockLabel } from '../time/zone-offsets';
import { representativeDay, type DaySelection, type DstDay } from './representative-day';

export interface SteadySlot {
  readonly minuteOfDay: number;
  /** Local clock time at the start of the slot, HH:MM. */
  readonly time: string;
  readonly priceImport: number;
  readonly chargeKw: number;
  readonly dischargeKw: number;
  /** Energy at the end of the slot, kWh. */
  readonly socKwh: number;
  /**
   * Value of stored energy at the end of the slot, currency/MWh: the derivative of
   * the steady cost with respect to energy added then, where it is unique; else the
   * middle of `storedEnergyValueRange` (see value-intervals.ts).
   */
  readonly storedEnergyValue: number;
  /** All optimal values at the end of the slot: one kWh more is worth `low`, one kWh less costs `high`. */
  readonly storedEnergyValueRange: { readonly low: number; readonly high: number };
}

export interface SteadyCycle {
  readonly status: SolveStatus;
  readonly message?: string;
  readonly slotMinutes: number;
  readonly slots: readonly SteadySlot[];
  /** Energy at the start (and end) of the day, kWh. */
  readonly socStartKwh: number;
  /** Money paid per representative day (negative = earnings). */
  readonly costPerDay: number;
  readonly equivalentCyclesPerDay: number;
  readonly days: number;
  readonly dstDays: readonly DstDay[];
  readonly notes: readonly string[];
  readonly simultaneousSteps: readonly number[];
}

export type SteadyResult = { ok: true; cycle: SteadyCycle } | { ok: false; issue: InputIssue };

export interface SteadyOptions {
  readonly from?: number;
  readonly to?: number;
  readonly days?: DaySelection;
}

export function solveSteadyCycle(inputs: AlignedInputs, options: SteadyOptions = {}): SteadyResult {
  const rep = representativeDay(inputs, options.from, options.to, options.days);
  if (!rep.ok) return rep;
  const day = rep.day;
  const demand = inputs.site.demandChargePerKw;
  const problem: DispatchProblem = {
    stepHours: inputs.stepHours,
    timesMs: day.slotStartMinutes.map((m) => m * 60_000),
    priceImport: day.priceImport,
    priceExport: day.priceExport,
    loadKw: day.loadKw,
    generationKw: day.generationKw,
    battery: inputs.battery,
    site: { ...inputs.site, demandChargePerKw: demand === null ? null : demand / day.days },
    initialEnergyKwh: 0,
    freeInitialEnergy: true,
    terminal: { kind: 'cyclic' },
    dayIndex: day.slotStartMinutes.map(() => 0),
  };
  const { solution, model, primal } = solveDispatchLp(problem);
  const values: ValueIntervals =
    solution.status === 'optimal' && model && primal
      ? steadyValueIntervals(model, primal, solution.storedEnergyValue)
      : { value: [], low: [], high: [] };
  const base = { slotMinutes: day.slotMinutes, days: day.days, dstDays: day.dstDays, notes: day.notes };
  if (solution.status !== 'optimal') {
    return {
      ok: true,
      cycle: {
        ...base,
        status: solution.status,
        message: solution.message ?? '',
        slots: [],
        socStartKwh: NaN,
        costPerDay: NaN,
        equivalentCyclesPerDay: NaN,
        simultaneousSteps: [],
      },
    };
  }
  const discharged = solution.dischargeKw.reduce((sum, d) => sum + d * inputs.stepHours, 0);
  return {
    ok: true,
    cycle: {
      ...base,
      status: 'optimal',
      slots: day.slotStartMinutes.map((minute, k) => ({
        minuteOfDay: minute,
        time: clockLabel(minute),
        priceImport: day.priceImport[k]!,
        chargeKw: solution.chargeKw[k]!,
        dischargeKw: solution.dischargeKw[k]!,
        socKwh: solution.socKwh[k + 1]!,
        storedEnergyValue: values.value[k]!,
        storedEnergyValueRange: { low: values.low[k]!, high: values.high[k]! },
      })),
      socStartKwh: solution.socKwh[0]!,
      costPerDay: solution.cost,
      equivalentCyclesPerDay: discharged / usableEnergyKwh(inputs.battery),
      simultaneousSteps: solution.simultaneousSteps ?? [],
    },
  };
}

/** The steady cycle's slot that ends at local clock minute τ (the slot before τ, wrapping at midnight). */
function slotEndingAt(cycle: SteadyCycle, minuteOfDay: number): SteadySlot {
  const n = cycle.slots.length;
  const k = (((Math.ceil(minuteOfDay / cycle.slotMinutes) - 1) % n) + n) % n;
  return cycle.slots[k]!;
}

/** λ̄(τ): the steady stored-energy value at local clock minute τ, currency/MWh. */
export function steadyValueAt(cycle: SteadyCycle, minuteOfDay: number): number {
  return slotEndingAt(cycle, minuteOfDay).storedEnergyValue;
}

/** The steady cycle's SoC at local clock minute τ, kWh. */
export function steadySocAt(cycle: SteadyCycle, minuteOfDay: number): number {
  return slotEndingAt(cycle, minuteOfDay).socKwh;
}
