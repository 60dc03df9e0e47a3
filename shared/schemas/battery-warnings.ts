/**
 * The one rule set for battery settings outside common practice: warnings, not
 * errors (docs/model.md, "Cautions"). The battery form (while typing), the API (in
 * every battery response and a plan's inputs snapshot) and the engine's command
 * line all call it, so they always show the same list. Sources: docs/sources.md.
 */
import type { BatteryFields, BatteryWarning } from './battery';

/** Limits of the site the battery sits at; null = none. */
export interface SiteLimits {
  importLimitKw: number | null;
  exportLimitKw: number | null;
}

// Thresholds, with where each comes from:
// SoC window: 10–90 % is common practice, no authoritative value found [M]. Only a window
// reaching past 5 / 95 % is flagged, so the 0–100 % window the cautions name always is.
const SOC_LOW_PCT = 5;
const SOC_HIGH_PCT = 95;
// Efficiency per direction: 85 % round trip is representative for utility-scale lithium-ion
// [S: NREL ATB 2020], about 0.92 per direction; above 0.98 (a round trip above 96 %) is
// beyond what batteries achieve in practice [M].
const MAX_EFFICIENCY = 0.98;
// The US utility-scale fleet averaged 82 % round trip in 2019 [S: US EIA, reported 2021];
// below 70 % is far under any fleet average [M] and usually a typing slip (e.g. 0.7 per direction = 49 %).
const MIN_ROUND_TRIP = 0.7;
// C-rate (power / energy) above 1, a duration under one hour: planning studies use 2–10 h
// [S: NREL ATB 2020 and 2023] and arbitrage favours 1–4 h [S: Bradbury, Pratson and
// Patiño-Echeverri 2014]; faster than that is above most stationary batteries' rating [M].
const MAX_C_RATE = 1;
// Li-ion self-discharge is a few % per month [S, secondary: battery reference tables]:
// 0.1 %/h is about 70 % per month [D: 0.1 × 24 × 30 = 72].
const MAX_SELF_DISCHARGE_PCT_PER_HOUR = 0.1;
// Planning studies assume about one cycle per day [S: NREL ATB 2020]; twice that is the margin [M].
const MAX_CYCLES_PER_DAY = 2;

const fmt = (value: number, digits = 2) => String(Number(value.toFixed(digits)));

export function batteryWarnings(b: Omit<BatteryFields, 'name'>, site?: SiteLimits): BatteryWarning[] {
  const warnings: BatteryWarning[] = [];
  const add = (field: BatteryWarning['field'], message: string) => warnings.push({ field, message });

  if (b.socMinPct < SOC_LOW_PCT) {
    add(
      'socMinPct',
      `A minimum state of charge of ${fmt(b.socMinPct)} % is below common practice (10–90 %); check the maker's operating limits.`,
    );
  }
  if (b.socMaxPct > SOC_HIGH_PCT) {
    add(
      'socMaxPct',
      `A maximum state of charge of ${fmt(b.socMaxPct)} % is above common practice (10–90 %); check the maker's operating limits.`,
    );
  }
  if (b.efficiencyCharge > MAX_EFFICIENCY) {
    add(
      'efficiencyCharge',
      `A charging efficiency of ${fmt(b.efficiencyCharge, 3)} is above ${MAX_EFFICIENCY}: higher than batteries achieve in practice.`,
    );
  }
  if (b.efficiencyDischarge > MAX_EFFICIENCY) {
    add(
      'efficiencyDischarge',
      `A discharging efficiency of ${fmt(b.efficiencyDischarge, 3)} is above ${MAX_EFFICIENCY}: higher than batteries achieve in practice.`,
    );
  }
  const roundTrip = b.efficiencyCharge * b.efficiencyDischarge;
  if (roundTrip < MIN_ROUND_TRIP) {
    add(
      null,
      `The round-trip efficiency is ${fmt(roundTrip * 100, 1)} % (charging × discharging), far below the 82–85 % typical of lithium-ion; check both values.`,
    );
  }
  const chargeRate = b.powerChargeKw / b.energyKwh;
  if (chargeRate > MAX_C_RATE) {
    add(
      'powerChargeKw',
      `The charge power is ${fmt(chargeRate)} C (above 1 C: a full charge in under an hour); check the maker's rating.`,
    );
  }
  const dischargeRate = b.powerDischargeKw / b.energyKwh;
  if (dischargeRate > MAX_C_RATE) {
    add(
      'powerDischargeKw',
      `The discharge power is ${fmt(dischargeRate)} C (above 1 C: a full discharge in under an hour); check the maker's rating.`,
    );
  }
  if (b.selfDischargePctPerHour > MAX_SELF_DISCHARGE_PCT_PER_HOUR) {
    add(
      'selfDischargePctPerHour',
      `Self-discharge of ${fmt(b.selfDischargePctPerHour, 3)} % per hour is far above lithium-ion's few % per month.`,
    );
  }
  if (b.maxCyclesPerDay !== null && b.maxCyclesPerDay > MAX_CYCLES_PER_DAY) {
    add(
      'maxCyclesPerDay',
      `${fmt(b.maxCyclesPerDay)} cycles per day is well above the one cycle per day planning studies assume; check the warranty.`,
    );
  }
  // [D] the connection caps what the battery can draw from or send to the grid.
  if (site?.importLimitKw != null && b.powerChargeKw > site.importLimitKw) {
    add(
      'powerChargeKw',
      `The charge power is above the site's import limit of ${fmt(site.importLimitKw)} kW: charging from the grid will be capped by the connection.`,
    );
  }
  if (site?.exportLimitKw != null && b.powerDischargeKw > site.exportLimitKw) {
    add(
      'powerDischargeKw',
      `The discharge power is above the site's export limit of ${fmt(site.exportLimitKw)} kW: discharging to the grid will be capped by the connection.`,
    );
  }
  return warnings;
}

/** The same warnings as plain sentences, as a plan's inputs and the command line's output carry them. */
export function batteryWarningMessages(b: Omit<BatteryFields, 'name'>, site?: SiteLimits): string[] {
  return batteryWarnings(b, site).map((w) => w.message);
}
