import { z } from 'zod';
import { PROFILE_KINDS } from '../../profile-csv/profile-units';
import type { ProfileDetail, ProfileSummary } from '../profile';
import { instant, uuid } from './common';
import type { SameType } from './same-type';

export const profileSummarySchema = z
  .object({
    id: uuid,
    siteId: uuid,
    kind: z.enum(PROFILE_KINDS),
    name: z.string(),
    unit: z.string(),
    sourceUnit: z.string(),
    intervalEnding: z.boolean(),
    start: instant,
    end: instant,
    stepMinutes: z.number().int(),
    valueCount: z.number().int(),
    filledCount: z.number().int(),
    min: z.number(),
    max: z.number(),
    mean: z.number(),
    notes: z.array(z.string()),
    originalFilename: z.string(),
    originalSha256: z.string().regex(/^[0-9a-f]{64}$/),
    originalBytes: z.number().int(),
    uploadedBy: z.string(),
    uploadedByName: z.string().nullable(),
    uploadedAt: instant,
  })
  .meta({ id: 'ProfileSummary' });

export const profileDetailSchema = profileSummarySchema
  .extend({
    window: z.object({ offset: z.number().int(), start: instant, count: z.number().int() }),
    values: z.array(z.number()),
    filledIndexes: z.array(z.number().int()),
  })
  .meta({ id: 'ProfileDetail' });

/** The multipart form of `POST /api/sites/:id/profiles`. */
export const profileUploadFormSchema = z
  .object({
    file: z.string().meta({ format: 'binary', description: 'The CSV file (UTF-8, header row, time and value columns).' }),
    kind: z.enum(PROFILE_KINDS),
    unit: z.string().meta({ description: 'price: currency/MWh or currency/kWh; load and generation: kW, MW, kWh or MWh.' }),
    name: z.string().optional(),
    intervalEnding: z.enum(['true', 'false']).optional(),
    fillGaps: z.enum(['true', 'false']).optional(),
  })
  .meta({ id: 'ProfileUploadForm' });

export const profileSummaryMatches: SameType<z.infer<typeof profileSummarySchema>, ProfileSummary> = true;
export const profileDetailMatches: SameType<z.infer<typeof profileDetailSchema>, ProfileDetail> = true;
