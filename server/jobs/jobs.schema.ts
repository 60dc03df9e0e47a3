import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { JobKind } from '@shared/schemas/job';

/**
 * Progress of background jobs, one row per pg-boss job (same id). pg-boss keeps
 * the queue; this table keeps what pg-boss cannot: share done, time left, the
 * message to show, and a heartbeat that lets any worker spot a dead one.
 * Updates carry the attempt number, so a stale attempt cannot overwrite a newer one.
 */
export const jobProgress = pgTable(
  'job_progress',
  {
    jobId: uuid('job_id').primaryKey(),
    queue: text('queue').notNull(),
    /** The registered job kind (server/jobs/job-registry.ts). */
    kind: text('kind').$type<JobKind>().notNull(),
    entityId: uuid('entity_id').notNull(),
    state: text('state', { enum: ['queued', 'running', 'retrying', 'completed', 'failed'] })
      .notNull()
      .default('queued'),
    shareDone: doublePrecision('share_done').notNull().default(0),
    etaSeconds: doublePrecision('eta_seconds'),
    message: text('message'),
    error: text('error'),
    attempt: integer('attempt').notNull().default(0),
    /** host:pid of the worker process on the current attempt. */
    worker: text('worker'),
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp('started_at', { withTimezone: true }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('job_progress_entity_idx').on(t.entityId),
    index('job_progress_state_idx').on(t.state),
    check('job_progress_share_done_range', sql`${t.shareDone} >= 0 and ${t.shareDone} <= 1`),
    check('job_progress_state_known', sql`${t.state} in ('queued', 'running', 'retrying', 'completed', 'failed')`),
  ],
);

export type JobProgressRow = typeof jobProgress.$inferSelect;
