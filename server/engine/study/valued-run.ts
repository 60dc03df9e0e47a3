/**
 * A study run's money figures beside its cash cost (DESIGN section 3.1): stored
 * energy over the period valued at the steady cycle's λ̄ exactly as on the
 * reference path, net cost, battery value, and the gap to the reference path in
 * currency and in % of the reference path's battery value.
 */
import type { AlignedInputs } from '../inputs/align-inputs';
import type { SteadyCycle } from '../steady/solve-steady-cycle';
import { netFiguresOfCost } from '../value/net-figures';
import type { StudyJobContext, StudyJobResult } from './study-job';

/** gapValue as % of the reference battery value, 0 when the gap is within rounding. */
export function valueGapPct(gapValue: number, referenceNetCost: number, referenceBatteryValue: number): number {
  return Math.abs(gapValue) <= 1e-9 * Math.max(1, Math.abs(referenceNetCost))
    ? 0
    : (100 * gapValue) / Math.max(Math.abs(referenceBatteryValue), 1e-9);
}

export function valuedRun(
  inputs: AlignedInputs,
  context: StudyJobContext,
  result: StudyJobResult,
  reference: { netCost: number; batteryValue: number },
  steady: { steady?: SteadyCycle; unvalued?: string },
) {
  if (result.status !== 'optimal') {
    const none = {
      storedEnergyChange: NaN,
      netCost: NaN,
      noBatteryCost: NaN,
      batteryValue: NaN,
      gapValue: NaN,
      valueGapPct: NaN,
    };
    return { ...none, endEnergyKwh: NaN, cycling: null };
  }
  const net = netFiguresOfCost(
    inputs,
    context.from,
    context.to,
    result.cost,
    { startEnergyKwh: context.initialEnergyKwh, endEnergyKwh: result.endEnergyKwh },
    steady.steady,
    steady.unvalued,
  );
  const gapValue = net.netCost - reference.netCost;
  return {
    storedEnergyChange: net.storedEnergyChange,
    netCost: net.netCost,
    noBatteryCost: net.noBatteryCost,
    batteryValue: net.batteryValue,
    gapValue,
    valueGapPct: valueGapPct(gapValue, reference.netCost, reference.batteryValue),
  };
}
