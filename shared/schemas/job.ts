/**
 * Background jobs as the browser sees them: which thing is being computed, how
 * far along it is, and what went wrong. pg-boss runs the jobs; progress lives
 * in our own job_progress table because pg-boss has no progress API.
 */
import { z } from 'zod';

export const jobKinds = ['plan', 'study'] as const;
export type JobKind = (typeof jobKinds)[number];

/**
 * queued: waiting for a worker; running: a worker is on it; retrying: an attempt
 * failed (or its worker stopped responding) and the job waits for another try;
 * completed: results stored; failed: no results, `error` says why.
 */
export const jobStates = ['queued', 'running', 'retrying', 'completed', 'failed'] as const;
export const jobStateSchema = z.enum(jobStates);
export type JobState = (typeof jobStates)[number];

export const activeJobStates: readonly JobState[] = ['queued', 'running', 'retrying'];

export interface JobProgress {
  id: string;
  kind: JobKind;
  /** The plan or horizon study the job computes. */
  entityId: string;
  state: JobState;
  /** Share of the work done, 0 to 1. */
  shareDone: number;
  /** Estimated seconds left, null until there is enough progress to estimate. */
  etaSeconds: number | null;
  message: string | null;
  /** The engine's or the worker's message when the job failed or is retrying. */
  error: string | null;
  /** 1 for the first try, 2 after one retry… */
  attempt: number;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  updatedAt: string;
}

export const jobListQuerySchema = z.strictObject({
  state: z
    .union([jobStateSchema, z.literal('active')], { error: 'Use one of queued, running, retrying, completed, failed or active.' })
    .optional(),
  kind: z.enum(jobKinds, { error: 'Use plan or study.' }).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type JobListQuery = z.infer<typeof jobListQuerySchema>;

/** A job in the attention list, with a label for the thing it computes. */
export interface JobListItem extends JobProgress {
  siteId: string | null;
  label: string;
}
