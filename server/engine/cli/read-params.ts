/**
 * Battery and site JSON files of the command line (the same keys), checked key
 * by key so a missing or mistyped key is named.
 */
import { readFileSync } from 'node:fs';
import type { BatteryParams, SiteParams } from '../types';
import { CliInputError } from './cli-args';

const BATTERY_KEYS = [
  'powerChargeKw',
  'powerDischargeKw',
  'energyKwh',
  'socMinPct',
  'socMaxPct',
  'socInitialPct',
  'efficiencyCharge',
  'efficiencyDischarge',
  'selfDischargePctPerHour',
  'degradationCostPerMwh',
  'maxCyclesPerDay',
] as const;
const NULLABLE_BATTERY = new Set<string>(['maxCyclesPerDay']);
/** Optional battery keys, null or absent = none: operating limits (docs/model.md) and the rated cycles per day. */
const OPTIONAL_BATTERY = ['rampKwPerMin', 'switchingCostPerMw', 'maxRatedCyclesPerDay'] as const;
const SITE_LIMITS = ['importLimitKw', 'exportLimitKw', 'demandChargePerKw'] as const;

export function readJsonFile(path: string, what: string): Record<string, unknown> {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (error) {
    throw new CliInputError(`cannot read the ${what} file ${path}: ${(error as NodeJS.ErrnoException).code ?? String(error)}`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new CliInputError(`the ${what} file ${path} is not valid JSON: ${(error as Error).message}`);
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new CliInputError(`the ${what} file ${path} must hold one JSON object`);
  }
  return value as Record<string, unknown>;
}

function numberKey(obj: Record<string, unknown>, key: string, nullable: boolean, file: string): number | null {
  if (!(key in obj)) throw new CliInputError(`${file} has no "${key}"${nullable ? ' (use null for none)' : ''}`);
  const value = obj[key];
  if (value === null && nullable) return null;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CliInputError(`"${key}" in ${file} must be a number${nullable ? ' or null' : ''} (got ${JSON.stringify(value)})`);
  }
  return value;
}

export function unknownKeys(obj: Record<string, unknown>, known: readonly string[]): string[] {
  return Object.keys(obj).filter((k) => !known.includes(k));
}

export function readBattery(path: string, warn: (message: string) => void): BatteryParams {
  const obj = readJsonFile(path, 'battery');
  const extra = unknownKeys(obj, [...BATTERY_KEYS, ...OPTIONAL_BATTERY]);
  if (extra.length > 0) warn(`ignoring unknown key(s) in ${path}: ${extra.join(', ')}`);
  const entries = BATTERY_KEYS.map((key) => [key, numberKey(obj, key, NULLABLE_BATTERY.has(key), path)]);
  // Absent optional keys stay absent, so a battery file without them reads exactly as before.
  const optional = OPTIONAL_BATTERY.filter((key) => key in obj).map((key) => [key, numberKey(obj, key, true, path)]);
  return Object.fromEntries([...entries, ...optional]);
}

export const DEFAULT_SITE: SiteParams = { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null };

export function readSite(path: string | undefined, warn: (message: string) => void): SiteParams {
  if (path === undefined) {
    warn('no --site given: local days and clock slots use UTC, and the grid has no limits and no demand charge');
    return DEFAULT_SITE;
  }
  const obj = readJsonFile(path, 'site');
  const extra = unknownKeys(obj, ['timezone', 'currency', ...SITE_LIMITS]);
  if (extra.length > 0) warn(`ignoring unknown key(s) in ${path}: ${extra.join(', ')}`);
  if (typeof obj.timezone !== 'string') throw new CliInputError(`${path} needs "timezone", an IANA name such as "Europe/Berlin"`);
  const currency = obj.currency;
  if (currency !== undefined && (typeof currency !== 'string' || !/^[A-Z]{3}$/.test(currency)))
    throw new CliInputError(
      `"currency" in ${path} must be a three-letter ISO 4217 code such as "EUR" (got ${JSON.stringify(currency)}); leave it out if not known`,
    );
  return {
    timezone: obj.timezone,
    importLimitKw: numberKey(obj, 'importLimitKw', true, path),
    exportLimitKw: numberKey(obj, 'exportLimitKw', true, path),
    demandChargePerKw: numberKey(obj, 'demandChargePerKw', true, path),
    ...(currency !== undefined ? { currency } : {}),
  };
}
