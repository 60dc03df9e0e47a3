/**
 * One attempt of one job: claim its progress row, keep a heartbeat, run the
 * handler, and decide what the end means: finished (stored, or failed for good),
 * handed back at shutdown without spending an attempt, or failed for another try.
 */
import type PgBoss from 'pg-boss';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { returnToQueue } from './boss';
import { JobContext } from './job-context';
import { ATTEMPT_FAILED, HANDED_BACK } from './job-messages';
import { finishJob, markJobHandedBack, markJobRetrying, markJobRunning, recordHeartbeat } from './job-progress.repo';
import { inJobTransaction } from './job-transaction';
import { JobFailure, type JobData, type JobHandler } from './job-types';
import type { JobsConfig } from './jobs-config';

interface AttemptOptions {
  readonly config: JobsConfig;
  readonly workerName: string;
  /** Fires when the worker stops: the attempt is handed back. */
  readonly signal: AbortSignal;
}

/** `finished`: tell pg-boss the job is done; `handed-back`: it is queued again already. A throw asks for a retry. */
export type AttemptEnd = 'finished' | 'handed-back';

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

/** Ends the job for good: the entity gets the message and the progress row turns `failed`, together. */
export async function failJobFinally(handler: JobHandler, data: JobData, attempt: number | null, message: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const finished = await finishJob(tx, data.jobId, attempt, { state: 'failed', message: 'The job failed.', error: message });
    if (finished) await handler.recordFailure(tx, data, message);
  });
}

/** The progress row and the pg-boss job go back to the queue together, the attempt unspent. */
async function handBack(job: PgBoss.JobWithMetadata<JobData>, attempt: number, config: JobsConfig): Promise<void> {
  await inJobTransaction(async (t) => {
    // False when a reaper already took the attempt over (it hands the job back itself).
    if (await markJobHandedBack(t.tx, job.id, attempt, HANDED_BACK)) {
      await returnToQueue(t.bossDb, config.PGBOSS_SCHEMA, job.name, job.id);
    }
  });
}

export async function runClaimedJob(
  handler: JobHandler,
  job: PgBoss.JobWithMetadata<JobData>,
  options: AttemptOptions,
): Promise<AttemptEnd> {
  const attempt = job.retryCount + 1;
  const data = { ...job.data, jobId: job.id };
  const db = getDb();
  // False when the job already finished (a retry after results were stored) or a newer attempt owns it.
  if (!(await markJobRunning(db, job.id, attempt, options.workerName))) return 'finished';

  const heartbeat = setInterval(() => {
    recordHeartbeat(db, job.id, attempt).catch((error: unknown) => logger.error(`Heartbeat of job ${job.id} failed`, error));
  }, options.config.heartbeatMs);
  const ctx = new JobContext(job.id, attempt, options.signal);
  try {
    await options.config.beforeHandler?.(options.signal);
    if (options.signal.aborted) throw new Error('The worker stopped before the job began.');
    await handler.run(ctx, data);
    return 'finished';
  } catch (error) {
    // No heartbeat or progress of this attempt may land after what follows.
    clearInterval(heartbeat);
    await ctx.flush();
    const message = messageOf(error);
    if (error instanceof JobFailure) {
      // Deterministic: another attempt would fail the same way.
      await failJobFinally(handler, data, attempt, message);
      return 'finished';
    }
    if (options.signal.aborted) {
      // A stop at shutdown is routine, not a failure: another worker starts the same attempt afresh.
      await handBack(job, attempt, options.config);
      logger.info(`Job ${job.id} (${handler.kind}) attempt ${attempt} handed back at shutdown.`);
      return 'handed-back';
    }
    if (attempt > job.retryLimit) {
      await failJobFinally(handler, data, attempt, `${message} (after ${attempt} attempts)`);
    } else {
      await markJobRetrying(db, job.id, attempt, { error: message, message: ATTEMPT_FAILED });
    }
    logger.error(`Job ${job.id} (${handler.kind}) attempt ${attempt} failed`, error);
    throw error; // pg-boss retries it, or moves it to the dead-letter queue
  } finally {
    clearInterval(heartbeat);
  }
}
