/**
 * Finds running jobs whose worker stopped sending heartbeats (process killed,
 * machine gone) and hands them back to pg-boss for a retry, long before the
 * pg-boss expiry would. Every worker runs one; a conditional update makes sure
 * only one of them acts on a given attempt.
 */
import type PgBoss from 'pg-boss';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { LOST_WORKER_ERROR, WORKER_LOST } from './job-messages';
import { findStaleJobs, markJobRetrying } from './job-progress.repo';
import type { JobsConfig } from './jobs-config';

export async function reapStaleJobs(boss: PgBoss, config: JobsConfig): Promise<number> {
  const db = getDb();
  let reaped = 0;
  for (const row of await findStaleJobs(db, config.JOB_STALE_SECONDS)) {
    const job = await boss.getJobById<unknown>(row.queue, row.jobId);
    // Not in this pg-boss schema (another installation sharing the database) or already archived.
    if (!job || !['active', 'created', 'retry'].includes(job.state)) continue;
    const sameAttempt = job.retryCount + 1 === row.attempt;
    if (job.state === 'active' && !sameAttempt) continue; // a newer attempt is running
    if (row.state === 'retrying') {
      // The attempt gave up but its hand-back to pg-boss was lost (process stopped right then): hand it back now.
      if (job.state === 'active') await boss.fail(row.queue, row.jobId, { message: row.error ?? LOST_WORKER_ERROR });
      continue;
    }
    if (!(await markJobRetrying(db, row.jobId, row.attempt, { error: LOST_WORKER_ERROR, message: WORKER_LOST }))) continue; // another reaper won
    if (job.state === 'active') await boss.fail(row.queue, row.jobId, { message: LOST_WORKER_ERROR });
    reaped += 1;
    logger.info(`Job ${row.jobId} had no heartbeat for ${config.JOB_STALE_SECONDS} s; handed back for a retry.`);
  }
  return reaped;
}

export function startStaleJobReaper(boss: PgBoss, config: JobsConfig): { stop(): void } {
  let busy = false;
  const everyMs = Math.max(1000, (config.JOB_STALE_SECONDS * 1000) / 2);
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    reapStaleJobs(boss, config)
      .catch((error: unknown) => logger.error('Looking for stale jobs failed', error))
      .finally(() => (busy = false));
  }, everyMs);
  timer.unref();
  return { stop: () => clearInterval(timer) };
}
