/**
 * DispatchProblems cut from aligned inputs, and the small conversions around them
 * (instants to step indexes, SoC percentages to kWh).
 */
import type { DispatchProblem, TerminalRule } from '../types';
import type { AlignedInputs } from './align-inputs';
import { sliceLimits } from './limit-inputs';

export interface ProblemExtras {
  readonly freeInitialEnergy?: boolean;
  readonly peakFloorKw?: number;
  readonly dischargedFirstDayKwh?: number;
  readonly initialNetPowerKw?: number;
}

/** The dispatch problem over steps [from, to) of the aligned inputs. */
export function problemFor(
  inputs: AlignedInputs,
  from: number,
  to: number,
  initialEnergyKwh: number,
  terminal: TerminalRule,
  extras: ProblemExtras = {},
): DispatchProblem {
  return {
    stepHours: inputs.stepHours,
    timesMs: inputs.timesMs.slice(from, to),
    priceImport: inputs.priceImport.slice(from, to),
    priceExport: inputs.priceExport.slice(from, to),
    loadKw: inputs.loadKw.slice(from, to),
    generationKw: inputs.generationKw.slice(from, to),
    battery: inputs.battery,
    site: inputs.site,
    initialEnergyKwh,
    terminal,
    dayIndex: Array.from(inputs.clock.localDay.subarray(from, to)),
    ...sliceLimits(inputs, from, to),
    ...extras,
  };
}

export function socPctToKwh(inputs: { battery: { energyKwh: number } }, pct: number): number {
  return (inputs.battery.energyKwh * pct) / 100;
}

export function usableEnergyKwh(battery: { energyKwh: number; socMinPct: number; socMaxPct: number }): number {
  return (battery.energyKwh * (battery.socMaxPct - battery.socMinPct)) / 100;
}

/** End instant of the grid (exclusive). */
export function gridEndMs(inputs: AlignedInputs): number {
  return inputs.timesMs[0]! + inputs.timesMs.length * inputs.stepMinutes * 60_000;
}

export type StepIndex = { ok: true; index: number } | { ok: false; message: string };

/** Step index of an instant on the grid; the grid end itself is allowed (exclusive ends). */
export function stepIndexOf(inputs: AlignedInputs, ms: number, what: string): StepIndex {
  const stepMs = inputs.stepMinutes * 60_000;
  const first = inputs.timesMs[0]!;
  const end = gridEndMs(inputs);
  if (!Number.isFinite(ms)) return { ok: false, message: `${what} is not a valid time` };
  if (ms < first || ms > end) {
    return {
      ok: false,
      message: `${what} ${new Date(ms).toISOString()} is outside the data period ${new Date(first).toISOString()} – ${new Date(end).toISOString()}`,
    };
  }
  if ((ms - first) % stepMs !== 0) {
    return {
      ok: false,
      message: `${what} ${new Date(ms).toISOString()} does not fall on an interval boundary of the ${inputs.stepMinutes}-minute profile`,
    };
  }
  return { ok: true, index: (ms - first) / stepMs };
}
