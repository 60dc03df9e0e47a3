import { z } from 'zod';
import { jobKinds, jobStates, type JobListItem, type JobProgress } from '../job';
import { instant, uuid } from './common';
import type { SameType } from './same-type';

export const jobProgressSchema = z
  .object({
    id: z.string(),
    kind: z.enum(jobKinds),
    entityId: uuid,
    state: z.enum(jobStates),
    shareDone: z.number().min(0).max(1),
    etaSeconds: z.number().nullable(),
    message: z.string().nullable(),
    error: z.string().nullable(),
    attempt: z.number().int(),
    createdAt: instant,
    startedAt: instant.nullable(),
    finishedAt: instant.nullable(),
    updatedAt: instant,
  })
  .meta({ id: 'JobProgress' });

export const jobListItemSchema = jobProgressSchema
  .extend({ siteId: uuid.nullable(), label: z.string() })
  .meta({ id: 'JobListItem' });

export const jobProgressMatches: SameType<z.infer<typeof jobProgressSchema>, JobProgress> = true;
export const jobListItemMatches: SameType<z.infer<typeof jobListItemSchema>, JobListItem> = true;
