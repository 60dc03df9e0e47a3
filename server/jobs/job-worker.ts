/**
 * A job worker: takes jobs of every registered kind from pg-boss, runs them with
 * heartbeats and progress, retries what another attempt may fix, hands running
 * jobs back unspent when it stops, and takes over jobs of workers that stopped
 * responding. The web server runs one by default; `npm run worker` starts more,
 * on any machine that reaches the database.
 *
 * Each slot fetches and settles its own jobs rather than using pg-boss's `work`
 * loop, because a job handed back at shutdown must not be completed or failed
 * by that loop afterwards (another worker may already be running it).
 */
import os from 'node:os';
import { setTimeout as sleep } from 'node:timers/promises';
import type PgBoss from 'pg-boss';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { DEAD_LETTER_QUEUE, ensureBoss } from './boss';
import { failDeadJob } from './dead-letter';
import { registeredHandlers } from './job-registry';
import type { JobData, JobHandler } from './job-types';
import { loadJobsConfig, type JobsConfig } from './jobs-config';
import { runClaimedJob } from './run-job';
import { startStaleJobReaper } from './stale-job-reaper';
import { closeThreads, prewarmThreads } from './thread-pool';

export interface JobWorker {
  /** Stops taking jobs; running attempts are cancelled and handed back without spending an attempt. */
  stop(): Promise<void>;
}

const POLL_MS = 1000;

interface Slot {
  readonly boss: PgBoss;
  readonly handler: JobHandler;
  readonly config: JobsConfig;
  readonly workerName: string;
  readonly stopping: AbortSignal;
}

async function settle(slot: Slot, job: PgBoss.JobWithMetadata<JobData>): Promise<void> {
  const { boss, handler } = slot;
  try {
    const end = await runClaimedJob(handler, job, { config: slot.config, workerName: slot.workerName, signal: slot.stopping });
    if (end === 'finished') await boss.complete(handler.queue, job.id);
  } catch (error) {
    // pg-boss retries it, or moves it to the dead-letter queue when no attempt is left.
    await boss.fail(handler.queue, job.id, { message: error instanceof Error ? error.message : String(error) });
  }
}

async function workSlot(slot: Slot): Promise<void> {
  while (!slot.stopping.aborted) {
    try {
      const [job] = await slot.boss.fetch<JobData>(slot.handler.queue, { includeMetadata: true, batchSize: 1 });
      if (job) {
        await settle(slot, job);
        continue;
      }
    } catch (error) {
      logger.error(`Taking a job from ${slot.handler.queue} failed`, error);
    }
    await sleep(POLL_MS, undefined, { signal: slot.stopping }).catch(() => undefined);
  }
}

export async function startJobWorker(databaseUrl: string, config: JobsConfig = loadJobsConfig()): Promise<JobWorker> {
  const boss = await ensureBoss(databaseUrl, config);
  const workerName = `${os.hostname()}:${process.pid}`;
  const stop = new AbortController();
  const handlers = registeredHandlers();
  const slots: Promise<void>[] = [];
  for (const handler of handlers) {
    for (let n = 0; n < config.WORKER_CONCURRENCY; n++) {
      slots.push(workSlot({ boss, handler, config, workerName, stopping: stop.signal }));
    }
  }
  const deadLetterId = await boss.work<JobData>(
    DEAD_LETTER_QUEUE,
    { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: 2 },
    async (jobs) => {
      for (const job of jobs) await failDeadJob(getDb(), job);
    },
  );
  const reaper = startStaleJobReaper(boss, config);
  // One thread per job slot, started now so the first job does not wait for the engine to load.
  prewarmThreads(config.WORKER_CONCURRENCY * handlers.length);
  logger.info(`Job worker ${workerName} started (${config.WORKER_CONCURRENCY} per queue).`);

  return {
    async stop() {
      reaper.stop();
      await boss.offWork({ id: deadLetterId });
      stop.abort();
      // Every slot ends with its attempt settled (handed back), before pg-boss itself stops.
      await Promise.all(slots);
      await closeThreads();
      logger.info(`Job worker ${workerName} stopped.`);
    },
  };
}
