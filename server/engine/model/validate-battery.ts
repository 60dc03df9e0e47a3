/**
 * Checks of battery and site parameters. Each check names the parameter, says
 * what is wrong and how to fix it; the first failing check is reported.
 */
import type { BatteryParams, SiteParams } from '../types';

export interface InputIssue {
  /** The offending parameter or profile, e.g. `battery.efficiencyCharge` or `priceImport`. */
  readonly field: string;
  /** Index of the first offending step, when the issue is in a series. */
  readonly step?: number;
  readonly message: string;
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function checkNumber(field: string, value: unknown, rule: (v: number) => boolean, expect: string): InputIssue | null {
  if (!finite(value)) return { field, message: `${field} must be a number (got ${String(value)})` };
  return rule(value) ? null : { field, message: `${field} is ${value}; it must be ${expect}` };
}

function checkOptional(field: string, value: unknown, rule: (v: number) => boolean, expect: string): InputIssue | null {
  return value === null ? null : checkNumber(field, value, rule, expect);
}

export function validateBattery(b: BatteryParams): InputIssue | null {
  const checks: (() => InputIssue | null)[] = [
    () => checkNumber('battery.powerChargeKw', b.powerChargeKw, (v) => v >= 0, 'zero or more kW'),
    () => checkNumber('battery.powerDischargeKw', b.powerDischargeKw, (v) => v >= 0, 'zero or more kW'),
    () => checkNumber('battery.energyKwh', b.energyKwh, (v) => v > 0, 'more than 0 kWh'),
    () => checkNumber('battery.socMinPct', b.socMinPct, (v) => v >= 0 && v <= 100, 'between 0 and 100 %'),
    () => checkNumber('battery.socMaxPct', b.socMaxPct, (v) => v >= 0 && v <= 100, 'between 0 and 100 %'),
    () =>
      b.socMinPct < b.socMaxPct
        ? null
        : {
            field: 'battery.socMaxPct',
            message: `the SoC window is empty: socMinPct ${b.socMinPct} % is not below socMaxPct ${b.socMaxPct} %; lower the minimum or raise the maximum`,
          },
    () => checkNumber('battery.socInitialPct', b.socInitialPct, () => true, ''),
    () =>
      b.socInitialPct >= b.socMinPct && b.socInitialPct <= b.socMaxPct
        ? null
        : {
            field: 'battery.socInitialPct',
            message: `the initial SoC ${b.socInitialPct} % is outside the SoC window ${b.socMinPct}–${b.socMaxPct} %`,
          },
    () => checkNumber('battery.efficiencyCharge', b.efficiencyCharge, (v) => v > 0 && v <= 1, 'in (0, 1], e.g. 0.92'),
    () => checkNumber('battery.efficiencyDischarge', b.efficiencyDischarge, (v) => v > 0 && v <= 1, 'in (0, 1], e.g. 0.92'),
    () =>
      checkNumber(
        'battery.selfDischargePctPerHour',
        b.selfDischargePctPerHour,
        (v) => v >= 0 && v < 100,
        'zero or more and below 100 % per hour',
      ),
    () => checkNumber('battery.degradationCostPerMwh', b.degradationCostPerMwh, (v) => v >= 0, 'zero or more per MWh'),
    () => checkOptional('battery.maxCyclesPerDay', b.maxCyclesPerDay, (v) => v > 0, 'more than 0, or null for no cap'),
    () =>
      checkOptional(
        'battery.maxRatedCyclesPerDay',
        b.maxRatedCyclesPerDay ?? null,
        (v) => v > 0,
        'more than 0 equivalent full cycles per day, or null when the rating is not known',
      ),
  ];
  for (const check of checks) {
    const issue = check();
    if (issue) return issue;
  }
  return null;
}

// Creating an Intl formatter costs ~0.3 ms; receding-horizon loops validate thousands of windows.
const knownZones = new Set<string>();

export function isValidTimeZone(zone: string): boolean {
  if (knownZones.has(zone)) return true;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    knownZones.add(zone);
    return true;
  } catch {
    return false;
  }
}

export function validateSite(s: SiteParams): InputIssue | null {
  if (typeof s.timezone !== 'string' || !isValidTimeZone(s.timezone)) {
    return {
      field: 'site.timezone',
      message: `site.timezone "${String(s.timezone)}" is not an IANA time zone such as Europe/Berlin`,
    };
  }
  return (
    checkOptional('site.importLimitKw', s.importLimitKw, (v) => v >= 0, 'zero or more kW, or null for no limit') ??
    checkOptional('site.exportLimitKw', s.exportLimitKw, (v) => v >= 0, 'zero or more kW, or null for no limit') ??
    checkOptional('site.demandChargePerKw', s.demandChargePerKw, (v) => v >= 0, 'zero or more per kW, or null for none')
  );
}
