/**
 * Jobs whose last attempt ended without a handler deciding (a worker killed on
 * its last try, or expiry) arrive here: their entity gets a final message so
 * nothing stays "running" for ever.
 */
import type PgBoss from 'pg-boss';
import type { Db } from '../db/client';
import { logger } from '../logger';
import { getJobProgress } from './job-progress.repo';
import { registeredHandlers } from './job-registry';
import { failJobFinally } from './run-job';
import type { JobData } from './job-types';

export async function failDeadJob(db: Db, job: PgBoss.JobWithMetadata<JobData>): Promise<void> {
  const data = job.data;
  const handler = registeredHandlers().find((h) => h.kind === data.kind);
  const progress = await getJobProgress(db, data.jobId);
  if (!handler || !progress || progress.state === 'completed' || progress.state === 'failed') return;
  const last = progress.error ? ` Last error: ${progress.error}` : '';
  const message = `The job was given up after ${progress.attempt} attempt${progress.attempt === 1 ? '' : 's'}.${last}`;
  logger.error(`Job ${data.jobId} (${data.kind}) moved to the dead-letter queue: ${message}`);
  await failJobFinally(handler, data, null, message);
}
