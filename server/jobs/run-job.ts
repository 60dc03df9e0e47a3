/**
 * One attempt of one job: claim its progress row, keep a heartbeat, run the
 * handler, and decide what a failure means (final, or worth another attempt).
 */
import type PgBoss from 'pg-boss';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { JobContext } from './job-context';
import { finishJob, markJobRetrying, markJobRunning, recordHeartbeat } from './job-progress.repo';
import { JobFailure, type JobData, type JobHandler } from './job-types';
import type { JobsConfig } from './jobs-config';

interface AttemptOptions {
  readonly config: JobsConfig;
  readonly workerName: string;
  readonly signal: AbortSignal;
}

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

/** Ends the job for good: the entity gets the message and the progress row turns `failed`, together. */
export async function failJobFinally(handler: JobHandler, data: JobData, attempt: number | null, message: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const finished = await finishJob(tx, data.jobId, attempt, { state: 'failed', message: 'The job failed.', error: message });
    if (finished) await handler.recordFailure(tx, data, message);
  });
}

export async function runClaimedJob(
  handler: JobHandler,
  job: PgBoss.JobWithMetadata<JobData>,
  options: AttemptOptions,
): Promise<void> {
  const attempt = job.retryCount + 1;
  const data = { ...job.data, jobId: job.id };
  const db = getDb();
  // False when the job already finished (a retry after results were stored) or a newer attempt owns it.
  if (!(await markJobRunning(db, job.id, attempt, options.workerName))) return;

  const heartbeat = setInterval(() => {
    recordHeartbeat(db, job.id, attempt).catch((error: unknown) => logger.error(`Heartbeat of job ${job.id} failed`, error));
  }, options.config.heartbeatMs);
  const ctx = new JobContext(job.id, attempt, options.signal);
  try {
    await options.config.beforeHandler?.(options.signal);
    await handler.run(ctx, data);
  } catch (error) {
    await ctx.flush();
    const message = messageOf(error);
    if (error instanceof JobFailure) {
      // Deterministic: another attempt would fail the same way. pg-boss marks the job done.
      await failJobFinally(handler, data, attempt, message);
      return;
    }
    if (attempt > job.retryLimit) {
      await failJobFinally(handler, data, attempt, `${message} (after ${attempt} attempts)`);
    } else {
      await markJobRetrying(db, job.id, attempt, message);
    }
    // A cancel at shutdown is routine: the job goes back to the queue for another worker.
    if (options.signal.aborted) logger.info(`Job ${job.id} (${handler.kind}) attempt ${attempt} handed back at shutdown.`);
    else logger.error(`Job ${job.id} (${handler.kind}) attempt ${attempt} failed`, error);
    throw error; // pg-boss retries it, or moves it to the dead-letter queue
  } finally {
    clearInterval(heartbeat);
  }
}
