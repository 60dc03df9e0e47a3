/**
 * Options sent with a profile upload (multipart fields beside `file`).
 * Multipart fields arrive as strings, so the booleans accept
 * "true"/"false" (and zod's other stringbool words) as well as JSON booleans.
 * The unit must be one accepted for the chosen kind.
 */
import { z } from 'zod';
import { ACCEPTED_UNITS, PROFILE_KINDS, isAcceptedUnit } from '../profile-csv/profile-units';
import { resolveProfileUnit } from '../profile-csv/price-units';

const flag = z.union([z.boolean(), z.stringbool()]).default(false);

/** A choice among a few words; an empty multipart field counts as not given. */
const optionalChoice = <T extends string>(values: readonly [T, ...T[]], message: string) =>
  z.preprocess((v) => (v === '' ? undefined : v), z.enum(values, { error: message }).optional());

export const profileKindSchema = z.enum(PROFILE_KINDS);

/** The upload's fields, whatever the site's currency. */
const uploadFields = {
  kind: profileKindSchema,
  unit: z.string().trim().min(1, 'Choose a unit.'),
  /** Labels mark the end of each interval; default: interval-beginning. */
  intervalEnding: flag,
  /** Fill missing intervals by linear interpolation; default: reject gaps. */
  fillGaps: flag,
  /** Dates written day first (08.12.2026 00:00) or month first (12/08/2026 00:00); default: ISO 8601 only. */
  dateOrder: optionalChoice(
    ['dmy', 'mdy'],
    'Choose dmy (day-month-year) or mdy (month-day-year), or leave dateOrder out for ISO 8601 dates.',
  ),
  /** The values' decimal separator; the other of "." and "," then separates thousands. Default: plain numbers. */
  decimalSeparator: optionalChoice(
    ['.', ','],
    'Choose "." or "," as the decimal separator, or leave decimalSeparator out for plain numbers.',
  ),
};

export const profileUploadOptionsSchema = z.object(uploadFields).superRefine((value, ctx) => {
  if (!isAcceptedUnit(value.kind, value.unit)) {
    ctx.addIssue({
      code: 'custom',
      path: ['unit'],
      message: `A ${value.kind} profile takes one of: ${ACCEPTED_UNITS[value.kind].join(', ')}.`,
    });
  }
});

export type ProfileUploadOptions = z.infer<typeof profileUploadOptionsSchema>;

/**
 * The same options for an upload to a site with this currency (ISO 4217): a
 * price profile may then also be in the site's currency per MWh or kWh (e.g.
 * EUR/MWh); another currency is refused on the unit field with the reason.
 */
export function profileUploadOptionsSchemaFor(currency: string) {
  return z.object(uploadFields).superRefine((value, ctx) => {
    const resolved = resolveProfileUnit(value.kind, value.unit, currency);
    if (!resolved.ok) ctx.addIssue({ code: 'custom', path: ['unit'], message: resolved.message });
  });
}
