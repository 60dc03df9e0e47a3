/**
 * A site: a grid connection point with a time zone, import/export limits and a
 * tariff (docs/model.md). The same keys as the engine's site JSON
 * (`timezone, importLimitKw, exportLimitKw, demandChargePerKw`, null = none).
 */
import { z } from 'zod';

/**
 * True when the runtime knows `name` as an IANA zone. Offsets such as "+01:00"
 * are refused even where Intl accepts them: a fixed offset has no daylight-saving
 * rules, so local times in uploads would be read wrongly half the year.
 */
export function isIanaTimeZone(name: string): boolean {
  if (!/^(UTC|[A-Za-z][A-Za-z_-]*(\/[A-Za-z0-9_+-]+)+)$/.test(name)) return false;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** Zones offered in the site form: the runtime's list plus UTC, which V8 leaves out of it. */
export function timeZoneChoices(): string[] {
  const zones = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return zones.includes('UTC') ? zones : ['UTC', ...zones];
}

const optionalKw = (what: string) =>
  z
    .number({ error: `Enter the ${what} in kW, or leave it empty for none.` })
    .min(0, `The ${what} cannot be negative.`)
    .max(10_000_000, `The ${what} is above 10 GW: enter it in kW.`)
    .nullable();

export const siteFieldsSchema = z.strictObject({
  name: z.string().trim().min(1, 'Give the site a name.').max(120, 'Use at most 120 characters.'),
  timezone: z.string().trim().refine(isIanaTimeZone, 'Choose an IANA time zone name from the list, such as Europe/Berlin.'),
  /** Largest grid import in kW; null = no limit. */
  importLimitKw: optionalKw('import limit'),
  /** Largest grid export in kW; null = no limit. */
  exportLimitKw: optionalKw('export limit'),
  /** Currency per kW of peak import over a plan; null = no demand charge. */
  demandChargePerKw: z
    .number({ error: 'Enter the demand charge per kW, or leave it empty for none.' })
    .min(0, 'The demand charge cannot be negative.')
    .nullable(),
  /** ISO 4217 code; prices in this site's profiles are in this currency. */
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 currency code such as EUR.'),
  /** Horizon proposed for new plans; null = choose per plan. 8784 h = one leap year. */
  defaultHorizonHours: z
    .number({ error: 'Enter the horizon in whole hours, or leave it empty.' })
    .int('Enter whole hours.')
    .min(1, 'The horizon is at least 1 hour.')
    .max(8784, 'The horizon is at most 8784 hours (one year).')
    .nullable(),
});

export const siteCreateSchema = siteFieldsSchema.extend({
  importLimitKw: siteFieldsSchema.shape.importLimitKw.default(null),
  exportLimitKw: siteFieldsSchema.shape.exportLimitKw.default(null),
  demandChargePerKw: siteFieldsSchema.shape.demandChargePerKw.default(null),
  currency: siteFieldsSchema.shape.currency.default('EUR'),
  defaultHorizonHours: siteFieldsSchema.shape.defaultHorizonHours.default(null),
});

/** PATCH: any subset of the fields; unknown keys (id, createdBy…) are refused, not ignored. */
export const sitePatchSchema = siteFieldsSchema
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send at least one field to change.');

export type SiteFields = z.infer<typeof siteFieldsSchema>;
export type SiteCreateInput = z.input<typeof siteCreateSchema>;
export type SitePatch = z.infer<typeof sitePatchSchema>;

export interface Site extends SiteFields {
  id: string;
  createdBy: string;
  createdAt: string;
  updatedAt: string;
  batteryCount: number;
  profileCount: number;
}
