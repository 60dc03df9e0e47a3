/**
 * The process's pg-boss instance, in the application's PostgreSQL. Queues are
 * created before anything is sent or worked (pg-boss 10 requires it): one per
 * registered job kind, each sending exhausted jobs to one dead-letter queue.
 */
import PgBoss from 'pg-boss';
import { logger } from '../logger';
import { registeredHandlers } from './job-registry';
import { loadJobsConfig, type JobsConfig } from './jobs-config';

export const DEAD_LETTER_QUEUE = 'job-dead-letter';

let starting: Promise<PgBoss> | null = null;

async function ensureQueues(boss: PgBoss, config: JobsConfig): Promise<void> {
  const dead: PgBoss.Queue = { name: DEAD_LETTER_QUEUE, policy: 'standard', retryLimit: 0, retentionMinutes: 7 * 24 * 60 };
  const work = (name: string): PgBoss.Queue => ({
    name,
    policy: 'standard',
    retryLimit: config.JOB_RETRY_LIMIT,
    retryDelay: 1,
    retryBackoff: false,
    expireInSeconds: config.JOB_EXPIRE_MINUTES * 60,
    retentionMinutes: 7 * 24 * 60,
    deadLetter: DEAD_LETTER_QUEUE,
  });
  // The dead-letter queue first: the work queues reference it.
  for (const queue of [dead, ...registeredHandlers().map((h) => work(h.queue))]) {
    if (await boss.getQueue(queue.name)) await boss.updateQueue(queue.name, queue);
    else await boss.createQueue(queue.name, queue);
  }
}

/** Starts pg-boss once per process (installing or migrating its schema when needed). */
export function ensureBoss(databaseUrl: string, config: JobsConfig = loadJobsConfig()): Promise<PgBoss> {
  if (!starting) {
    const boss = new PgBoss({
      connectionString: databaseUrl,
      schema: config.PGBOSS_SCHEMA,
      max: 4,
      application_name: 'slackwater-jobs',
      // Expired attempts are failed (and retried) by maintenance; check often.
      maintenanceIntervalSeconds: 30,
    });
    boss.on('error', (error) => logger.error('Job queue error', error));
    starting = boss
      .start()
      .then(async () => {
        await ensureQueues(boss, config);
        return boss;
      })
      .catch((error: unknown) => {
        starting = null;
        throw error;
      });
  }
  return starting;
}

/** Stops pg-boss: waits up to `timeoutMs` for running jobs, then fails them so another worker retries. */
export async function stopBoss(timeoutMs = 10_000): Promise<void> {
  const pending = starting;
  starting = null;
  if (!pending) return;
  const boss = await pending.catch(() => null);
  await boss?.stop({ graceful: true, timeout: timeoutMs, wait: true });
}

/**
 * Puts an active job back in its queue as if it had never started (pg-boss counts
 * a retry only for a job that has a start time), so a shutdown costs no attempt.
 * pg-boss has no call for this; the statement is written against its 10.x job
 * table (package.json pins the version). Runs on the caller's transaction.
 */
export async function returnToQueue(db: PgBoss.Db, schema: string, queue: string, jobId: string): Promise<boolean> {
  const { rows } = await db.executeSql(
    `update ${schema}.job set state = 'created', started_on = null, start_after = now()
     where name = $1 and id = $2 and state = 'active' returning id`,
    [queue, jobId],
  );
  return rows.length === 1;
}
