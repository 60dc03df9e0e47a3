/**
 * Defaults for a utility-scale lithium-ion battery, each with its source
 * (docs/sources.md; [S] published, [D] derived here, [M] from memory).
 */
import type { BatteryCreateInput, BatteryFields } from './battery';

/**
 * Round-trip efficiency 85 % [S: NREL Annual Technology Baseline 2020,
 * utility-scale battery storage], split evenly per direction: η_ch = η_dis = √0.85
 * = 0.92195…, rounded to 0.922 for the form [D: 0.922² = 0.850084, within 0.01 %
 * of 0.85].
 */
export const DEFAULT_ROUND_TRIP = 0.85;
export const DEFAULT_EFFICIENCY_PER_DIRECTION = Math.round(Math.sqrt(DEFAULT_ROUND_TRIP) * 1000) / 1000;

/** Duration 2 h, among the most common in planning studies [S: NREL ATB 2020 and 2023]. */
export const DEFAULT_DURATION_HOURS = 2;

/** About one cycle per day, as planning studies assume [S: NREL ATB 2020]. */
export const DEFAULT_MAX_CYCLES_PER_DAY = 1;

/** SoC window 10–90 %: common practice, no authoritative value found [M]. */
export const DEFAULT_SOC_MIN_PCT = 10;
export const DEFAULT_SOC_MAX_PCT = 90;

/** Start mid-window [D: (10 + 90) / 2], so neither charging nor discharging is blocked at step 0. */
export const DEFAULT_SOC_INITIAL_PCT = (DEFAULT_SOC_MIN_PCT + DEFAULT_SOC_MAX_PCT) / 2;

/** Li-ion self-discharge is a few % per month, negligible within a day [S, secondary: battery reference tables]. */
export const DEFAULT_SELF_DISCHARGE_PCT_PER_HOUR = 0;

/** A linear cost per MWh throughput is a convention, not a law [M]: a user parameter with no hidden default beyond 0. */
export const DEFAULT_DEGRADATION_COST_PER_MWH = 0;

/** The demo's 2 MW / 4 MWh size, used when nothing else is known. */
export const DEFAULT_ENERGY_KWH = 4000;

/** Every parameter of a lithium-ion battery of the given energy, power from the 2-hour duration. */
export function lithiumIonDefaults(energyKwh = DEFAULT_ENERGY_KWH): Omit<BatteryFields, 'name'> {
  const powerKw = energyKwh / DEFAULT_DURATION_HOURS;
  return {
    powerChargeKw: powerKw,
    powerDischargeKw: powerKw,
    energyKwh,
    socMinPct: DEFAULT_SOC_MIN_PCT,
    socMaxPct: DEFAULT_SOC_MAX_PCT,
    socInitialPct: DEFAULT_SOC_INITIAL_PCT,
    efficiencyCharge: DEFAULT_EFFICIENCY_PER_DIRECTION,
    efficiencyDischarge: DEFAULT_EFFICIENCY_PER_DIRECTION,
    selfDischargePctPerHour: DEFAULT_SELF_DISCHARGE_PCT_PER_HOUR,
    degradationCostPerMwh: DEFAULT_DEGRADATION_COST_PER_MWH,
    maxCyclesPerDay: DEFAULT_MAX_CYCLES_PER_DAY,
  };
}

/** A create request with every omitted parameter taken from the defaults (power from the given energy). */
export function withLithiumIonDefaults(input: BatteryCreateInput): BatteryFields {
  const defaults = lithiumIonDefaults(input.energyKwh);
  const filled: Record<string, unknown> = { ...defaults };
  for (const [key, value] of Object.entries(input)) if (value !== undefined) filled[key] = value;
  return filled as BatteryFields;
}
