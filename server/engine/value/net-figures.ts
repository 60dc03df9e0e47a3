/**
 * What a schedule over a window [from, to) of the grid is worth (DESIGN
 * section 3.1): cash cost, the change in the value of stored energy, net cost,
 * the same site without a battery, and the battery's value. Stored energy is
 * valued at the steady cycle's λ̄(τ), the value of energy held at the end of the
 * slot that ends at clock time τ, the same convention as a plan's λ_t:
 *   storedEnergyChange = (λ̄(τ_end)·e_end − λ̄(τ_start)·e_start)/1000
 *   netCost = cost − storedEnergyChange,  batteryValue = noBatteryCost − netCost.
 */
import type { AlignedInputs } from '../inputs/align-inputs';
import { scheduleCost, type CostedSeries } from '../dispatch/schedule-cost';
import { steadyValueAt, type SteadyCycle } from '../steady/solve-steady-cycle';
import { minuteOfDayAt } from '../terminal/terminal-choice';
import { clockLabel } from '../time/zone-offsets';

export interface StoredEnergyValuation {
  /** Whether stored energy was valued (false: no steady cycle; then storedEnergyChange is 0). */
  readonly valued: boolean;
  /** λ̄ at the window's start and end, currency/MWh (NaN when not valued). */
  readonly startValuePerMwh: number;
  readonly endValuePerMwh: number;
  /** Local clock times τ_start and τ_end, HH:MM. */
  readonly startClock: string;
  readonly endClock: string;
  readonly startEnergyKwh: number;
  readonly endEnergyKwh: number;
  /** One line for the screens, e.g. "Energy left in the battery valued at the steady cycle's 61.20 EUR/MWh for 00:00 …". */
  readonly description: string;
}

export interface NetFigures {
  /** Cash paid in the window incl. degradation and demand charge, no terminal value (negative = earnings). */
  readonly cost: number;
  /** Change in the value of the energy in the battery over the window (currency). */
  readonly storedEnergyChange: number;
  /** cost − storedEnergyChange: the figure every comparison ranks by. */
  readonly netCost: number;
  /** The same site, window and prices with no battery (0 for pure arbitrage). */
  readonly noBatteryCost: number;
  /** noBatteryCost − netCost: what the battery saves, net of the change in stored energy. */
  readonly batteryValue: number;
  readonly storedEnergyValuation: StoredEnergyValuation;
}

/** The window's schedule: flows per step of [from, to) and energy at its start and end. */
export interface WindowSchedule extends CostedSeries {
  readonly startEnergyKwh: number;
  readonly endEnergyKwh: number;
}

/** "61.20 EUR/MWh", or "61.20 per MWh" when the currency is not known. */
export function perMwh(value: number, currency?: string): string {
  return currency ? `${value.toFixed(2)} ${currency}/MWh` : `${value.toFixed(2)} per MWh`;
}

/** "12.30 EUR", or "12.30" when the currency is not known. */
export function money(value: number, currency?: string): string {
  return currency ? `${value.toFixed(2)} ${currency}` : value.toFixed(2);
}

function costInputs(inputs: AlignedInputs, from: number, to: number) {
  return {
    stepHours: inputs.stepHours,
    priceImport: inputs.priceImport.slice(from, to),
    priceExport: inputs.priceExport.slice(from, to),
    degradationCostPerMwh: inputs.battery.degradationCostPerMwh,
    demandChargePerKw: inputs.site.demandChargePerKw,
  };
}

/**
 * Cash cost of the site over [from, to) with no battery: the grid carries load
 * minus generation (import and export limits are not applied: with no battery
 * nothing can be shifted, so an export above the limit would be curtailed by
 * the site, which this figure does not model).
 */
export function noBatteryCost(inputs: AlignedInputs, from: number, to: number): number {
  const n = to - from;
  const series = { dischargeKw: new Float64Array(n), gridImportKw: new Float64Array(n), gridExportKw: new Float64Array(n) };
  for (let t = 0; t < n; t++) {
    const net = inputs.loadKw[from + t]! - inputs.generationKw[from + t]!;
    series.gridImportKw[t] = net > 0 ? net : 0;
    series.gridExportKw[t] = net < 0 ? -net : 0;
  }
  return scheduleCost(costInputs(inputs, from, to), series);
}

function valuationWords(v: Omit<StoredEnergyValuation, 'description' | 'valued'>, currency?: string): string {
  const end = `${perMwh(v.endValuePerMwh, currency)} for ${v.endClock}`;
  if (v.startClock === v.endClock)
    return `Energy in the battery valued at the steady cycle's ${end}, at the start and at the end.`;
  return `Energy left in the battery valued at the steady cycle's ${end}; energy at the start at ${perMwh(v.startValuePerMwh, currency)} for ${v.startClock}.`;
}

/**
 * Net figures of a window whose cash cost is known: grid steps [from, to),
 * energy at its start and end. `steady` null (or not optimal): stored energy is
 * not valued and `unvaluedReason` says why.
 */
export function netFiguresOfCost(
  inputs: AlignedInputs,
  from: number,
  to: number,
  cost: number,
  energy: { readonly startEnergyKwh: number; readonly endEnergyKwh: number },
  steady: SteadyCycle | null | undefined,
  unvaluedReason = 'there is no steady cycle to value it with',
): NetFigures {
  const baseline = noBatteryCost(inputs, from, to);
  const startMinute = minuteOfDayAt(inputs, from);
  const endMinute = minuteOfDayAt(inputs, to);
  const clocks = {
    startClock: clockLabel(startMinute),
    endClock: clockLabel(endMinute),
    startEnergyKwh: energy.startEnergyKwh,
    endEnergyKwh: energy.endEnergyKwh,
  };
  if (!steady || steady.status !== 'optimal') {
    return {
      cost,
      storedEnergyChange: 0,
      netCost: cost,
      noBatteryCost: baseline,
      batteryValue: baseline - cost,
      storedEnergyValuation: {
        valued: false,
        startValuePerMwh: NaN,
        endValuePerMwh: NaN,
        ...clocks,
        description: `Energy left in the battery is not valued: ${unvaluedReason}; net cost equals cash cost.`,
      },
    };
  }
  const values = { startValuePerMwh: steadyValueAt(steady, startMinute), endValuePerMwh: steadyValueAt(steady, endMinute) };
  const change = (values.endValuePerMwh * energy.endEnergyKwh - values.startValuePerMwh * energy.startEnergyKwh) / 1000;
  const netCost = cost - change;
  return {
    cost,
    storedEnergyChange: change,
    netCost,
    noBatteryCost: baseline,
    batteryValue: baseline - netCost,
    storedEnergyValuation: {
      valued: true,
      ...values,
      ...clocks,
      description: valuationWords({ ...values, ...clocks }, inputs.site.currency),
    },
  };
}

/** Net figures of a schedule over grid steps [from, to) (its cash cost by DESIGN section 3's rule). */
export function netFigures(
  inputs: AlignedInputs,
  from: number,
  to: number,
  schedule: WindowSchedule,
  steady: SteadyCycle | null | undefined,
  unvaluedReason?: string,
): NetFigures {
  const cost = scheduleCost(costInputs(inputs, from, to), schedule);
  return netFiguresOfCost(inputs, from, to, cost, schedule, steady, unvaluedReason);
}
