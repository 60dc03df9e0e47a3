/**
 * Plain words about the operating limits of a plan (DESIGN section 3.3): what
 * bound it, what reserve earned, and the warning on a delivery duration longer
 * than the usable energy can sustain at full power.
 */
import type { BatteryParams, DispatchProblem, LimitBinding } from '../types';
import { usableEnergyKwh } from '../inputs/problem-for';
import type { ReserveEffect } from './reserve-effect';
import { limitFeatures } from './limit-features';

const money = (v: number) => v.toFixed(2);
const kw = (v: number) => `${Math.round(v)} kW`;
const intervals = (n: number) => `${n} interval${n === 1 ? '' : 's'}`;

export const ACTIVATION_NOTE =
  'Reserve activation is assumed to be energy-neutral on average: the schedule holds the headroom but does not include the energy delivered when the system operator calls on the reserve.';

/** Warnings on a reserve duration the usable energy cannot sustain at full power, naming the limit. */
export function reserveDurationWarnings(battery: BatteryParams, reserveHours: number | undefined): string[] {
  if (reserveHours === undefined || !(reserveHours > 0)) return [];
  const usable = usableEnergyKwh(battery);
  const warnings: string[] = [];
  const upHours = (usable * battery.efficiencyDischarge) / battery.powerDischargeKw;
  const downHours = usable / (battery.efficiencyCharge * battery.powerChargeKw);
  if (reserveHours > upHours) {
    warnings.push(
      `The reserve duration ${reserveHours} h is longer than the usable energy allows at full power: ${Math.round(usable)} kWh usable sustain ${kw(battery.powerDischargeKw)} of upward reserve for only ${upHours.toFixed(2)} h, so upward reserve is limited to ${kw((usable * battery.efficiencyDischarge) / reserveHours)} even from a full battery.`,
    );
  }
  if (reserveHours > downHours) {
    warnings.push(
      `The reserve duration ${reserveHours} h is longer than the usable energy allows at full power: ${Math.round(usable)} kWh usable absorb ${kw(battery.powerChargeKw)} of downward reserve for only ${downHours.toFixed(2)} h, so downward reserve is limited to ${kw(usable / (battery.efficiencyCharge * reserveHours))} even from an empty battery.`,
    );
  }
  return warnings;
}

export interface LimitWordsInput {
  readonly binding: LimitBinding;
  readonly hasRamp: boolean;
  readonly hasAvailability: boolean;
  readonly reserveRevenue?: number;
  readonly switchingPenalty?: number;
  readonly effect?: ReserveEffect | null;
}

/** Sentences such as "ramp limit binding in 14 intervals", for the plan's limit notes. */
export function limitNotes(input: LimitWordsInput): string[] {
  const { binding: b } = input;
  const notes: string[] = [];
  if (input.hasRamp) notes.push(`ramp limit binding in ${intervals(b.rampIntervals)}`);
  if (input.hasAvailability) notes.push(`availability limiting the power in ${intervals(b.availabilityIntervals)}`);
  if (input.reserveRevenue !== undefined) {
    notes.push(`reserve revenue ${money(input.reserveRevenue)}`);
    notes.push(`reserve filling the power limit in ${intervals(b.reservePowerIntervals)}`);
    notes.push(`reserve filling the energy headroom in ${intervals(b.reserveEnergyIntervals)}`);
    if (b.reserveGridIntervals > 0) notes.push(`reserve filling the grid headroom in ${intervals(b.reserveGridIntervals)}`);
    if (input.effect) {
      notes.push(
        `holding reserve gave up ${money(input.effect.headroomCost)} of arbitrage over the lookahead, a net gain of ${money(input.effect.stackedGain)}`,
      );
    }
    notes.push(ACTIVATION_NOTE);
  }
  if (input.switchingPenalty !== undefined) {
    notes.push(
      `switching penalty ${money(input.switchingPenalty)} (not cash); net power changes sign between adjacent intervals ${b.signChanges} time${b.signChanges === 1 ? '' : 's'}`,
    );
  }
  return notes;
}

/** Extra words for an infeasible model with a ramp rate or availability (empty without them). */
export function limitInfeasibleHint(problem: DispatchProblem): string {
  const f = limitFeatures(problem);
  const parts = [
    ...(f.rampKwPerMin !== null
      ? [`the ramp rate (${f.rampKwPerMin} kW/min) may be too slow to reach the terminal rule in time`]
      : []),
    ...(f.availability ? ['the availability profile may leave too little power'] : []),
  ];
  return parts.length > 0 ? ` With the operating limits: ${parts.join('; ')}.` : '';
}
