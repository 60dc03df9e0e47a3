/**
 * Heavy cycling: more equivalent full cycles (discharged energy / usable
 * energy, DESIGN section 3) in a local day than the battery is rated for. The
 * rating is the battery's `maxRatedCyclesPerDay`; without one we flag above 2
 * per day, a common-practice threshold [M: planning studies assume about one
 * cycle per day (NREL ATB, REFERENCES), and warranties commonly allow one to
 * two], and say so. A flag, not a limit: the throughput cap `maxCyclesPerDay`
 * is the limit the optimisation keeps.
 */
import type { BatteryParams } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { usableEnergyKwh } from '../inputs/problem-for';
import { localDateLabel } from '../time/zone-offsets';

/** Equivalent full cycles per day flagged when the battery has no rating (common practice). */
export const COMMON_PRACTICE_CYCLES_PER_DAY = 2;

export interface CyclingCheck {
  /** Cycles per day above which the schedule is flagged. */
  readonly limitPerDay: number;
  readonly limitSource: 'battery rating' | 'common practice';
  /** The most equivalent full cycles in one local day of the window. */
  readonly highestPerDay: number;
  /** Local date (YYYY-MM-DD) of that day; null for a representative day. */
  readonly highestDay: string | null;
  readonly heavy: boolean;
  /** The flag in words when heavy, else null. */
  readonly message: string | null;
}

function limitOf(battery: BatteryParams): Pick<CyclingCheck, 'limitPerDay' | 'limitSource'> {
  const rated = battery.maxRatedCyclesPerDay;
  return typeof rated === 'number' && rated > 0
    ? { limitPerDay: rated, limitSource: 'battery rating' }
    : { limitPerDay: COMMON_PRACTICE_CYCLES_PER_DAY, limitSource: 'common practice' };
}

function check(battery: BatteryParams, highestPerDay: number, highestDay: string | null, where: string): CyclingCheck {
  const limit = limitOf(battery);
  const heavy = highestPerDay > limit.limitPerDay + 1e-9;
  const rule =
    limit.limitSource === 'battery rating'
      ? `the battery is rated for ${limit.limitPerDay} per day`
      : `no rating is set for this battery, so we flag above ${limit.limitPerDay} per day, as is common practice (set the battery's rated cycles per day to use its own)`;
  return {
    ...limit,
    highestPerDay,
    highestDay,
    heavy,
    message: heavy
      ? `Heavy cycling: ${where} the schedule makes ${highestPerDay.toFixed(2)} equivalent full cycles; ${rule}. Check the warranty, or set a daily throughput cap.`
      : null,
  };
}

/** The check over grid steps [from, from + dischargeKw.length), day by local day. */
export function cyclingCheck(inputs: AlignedInputs, from: number, dischargeKw: ArrayLike<number>): CyclingCheck {
  const usable = usableEnergyKwh(inputs.battery);
  const byDay = new Map<number, number>();
  for (let t = 0; t < dischargeKw.length; t++) {
    const day = inputs.clock.localDay[from + t]!;
    byDay.set(day, (byDay.get(day) ?? 0) + (dischargeKw[t]! * inputs.stepHours) / usable);
  }
  let highest = 0;
  let highestDay: number | null = null;
  for (const [day, cycles] of byDay) {
    if (cycles > highest) [highest, highestDay] = [cycles, day];
  }
  const date = highestDay === null ? null : localDateLabel(highestDay);
  return check(inputs.battery, highest, date, date === null ? 'in no day' : `on ${date}`);
}

/** The check of the steady cycle's representative day. */
export function steadyCyclingCheck(battery: BatteryParams, cyclesPerDay: number): CyclingCheck {
  return check(battery, cyclesPerDay, null, 'in the steady cycle’s representative day');
}
