/**
 * Stored profiles: a regular series in the canonical
 * unit of its kind (currency/MWh or kW), with the original file kept beside it.
 * Upload options live in profile-upload.ts; this adds the name and the responses.
 */
import { z } from 'zod';
import type { ProfileKind } from '../profile-csv/profile-units';
import { profileKindSchema } from './profile-upload';

/** Largest accepted upload, in bytes: 20 MB holds a year of 5-minute rows several times over. */
export const MAX_PROFILE_UPLOAD_BYTES = 20 * 1024 * 1024;

/** Optional display name sent beside `file`; the file name (without extension) otherwise. */
export const profileNameSchema = z.object({
  name: z
    .string()
    .trim()
    .max(120, 'Use at most 120 characters for the profile name.')
    .optional()
    .transform((v) => (v === '' ? undefined : v)),
});

/** `GET /api/sites/:id/profiles?kind=` */
export const profileListQuerySchema = z.strictObject({ kind: profileKindSchema.optional() });

/**
 * `GET /api/profiles/:id?from&to`: only the intervals starting in [from, to),
 * RFC 3339 instants with an offset. A year of 5-minute data is 105 120 values;
 * a window keeps a response small when a client needs a week of it.
 */
export const profileWindowQuerySchema = z
  .strictObject({
    from: z.iso
      .datetime({ offset: true, error: 'Give "from" as an RFC 3339 time with offset, e.g. 2026-01-05T00:00:00+01:00.' })
      .optional(),
    to: z.iso
      .datetime({ offset: true, error: 'Give "to" as an RFC 3339 time with offset, e.g. 2026-01-12T00:00:00+01:00.' })
      .optional(),
  })
  .refine((q) => !q.from || !q.to || Date.parse(q.from) < Date.parse(q.to), {
    path: ['to'],
    message: '"to" must be after "from".',
  });

export type ProfileWindowQuery = z.infer<typeof profileWindowQuerySchema>;

/** A profile without its values, as listed. */
export interface ProfileSummary {
  id: string;
  siteId: string;
  kind: ProfileKind;
  name: string;
  /** Canonical unit of the stored values: currency/MWh (in the site's currency) or kW. */
  unit: string;
  /** Unit chosen at upload, before conversion. */
  sourceUnit: string;
  intervalEnding: boolean;
  /** Start of the first interval (RFC 3339, UTC). */
  start: string;
  /** End of the last interval (exclusive). */
  end: string;
  stepMinutes: number;
  valueCount: number;
  filledCount: number;
  min: number;
  max: number;
  mean: number;
  notes: string[];
  originalFilename: string;
  originalSha256: string;
  originalBytes: number;
  uploadedBy: string;
  /** Display name of the uploader, when the account still exists. */
  uploadedByName: string | null;
  uploadedAt: string;
}

/** `GET /api/profiles/:id`: the summary plus the values of the requested window. */
export interface ProfileDetail extends ProfileSummary {
  window: {
    /** Index of values[0] within the whole series. */
    offset: number;
    /** Start of values[0] (RFC 3339, UTC). */
    start: string;
    count: number;
  };
  values: number[];
  /** Indexes (within the whole series) that were filled by interpolation. */
  filledIndexes: number[];
}

/** The 422 body of a rejected upload. */
export interface ProfileUploadRejection {
  error: string;
  issues: { line: number; message: string }[];
  hint: string;
}
