/**
 * Options sent with a profile upload (multipart fields beside `file`).
 * Multipart fields arrive as strings, so the booleans accept
 * "true"/"false" (and zod's other stringbool words) as well as JSON booleans.
 * The unit must be one accepted for the chosen kind.
 */
import { z } from 'zod';
import { ACCEPTED_UNITS, PROFILE_KINDS, isAcceptedUnit } from '../profile-csv/profile-units';

const flag = z.union([z.boolean(), z.stringbool()]).default(false);

export const profileKindSchema = z.enum(PROFILE_KINDS);

export const profileUploadOptionsSchema = z
  .object({
    kind: profileKindSchema,
    unit: z.string().trim().min(1, 'Choose a unit.'),
    /** Labels mark the end of each interval; default: interval-beginning. */
    intervalEnding: flag,
    /** Fill missing intervals by linear interpolation; default: reject gaps. */
    fillGaps: flag,
  })
  .superRefine((value, ctx) => {
    if (!isAcceptedUnit(value.kind, value.unit)) {
      ctx.addIssue({
        code: 'custom',
        path: ['unit'],
        message: `A ${value.kind} profile takes one of: ${ACCEPTED_UNITS[value.kind].join(', ')}.`,
      });
    }
  });

export type ProfileUploadOptions = z.infer<typeof profileUploadOptionsSchema>;
