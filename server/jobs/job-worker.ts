/**
 * A job worker: pulls plan and study jobs from pg-boss, runs them with
 * heartbeats and progress, retries what another attempt may fix, and takes
 * over jobs of workers that stopped responding. The web server runs one by
 * default; `npm run worker` starts more, on any machine that reaches the database.
 */
import os from 'node:os';
import type PgBoss from 'pg-boss';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { ensureBoss, queues } from './boss';
import { jobHandlers } from './job-handlers';
import { loadJobsConfig, type JobsConfig } from './jobs-config';
import { runClaimedJob } from './run-job';
import { startStaleJobReaper } from './stale-job-reaper';
import { failDeadJob } from './dead-letter';
import { closeThreads, prewarmThreads } from './run-in-thread';
import type { JobData } from './job-types';

export interface JobWorker {
  /** Stops taking jobs; running attempts are cancelled and handed back for a retry. */
  stop(): Promise<void>;
}

export async function startJobWorker(databaseUrl: string, config: JobsConfig = loadJobsConfig()): Promise<JobWorker> {
  const boss = await ensureBoss(databaseUrl, config);
  const workerName = `${os.hostname()}:${process.pid}`;
  const running = new Set<AbortController>();
  const workIds: string[] = [];

  for (const handler of jobHandlers) {
    const onJobs = async (jobs: PgBoss.JobWithMetadata<JobData>[]) => {
      // batchSize is 1, but pg-boss hands over an array: run them in turn.
      for (const job of jobs) {
        const abort = new AbortController();
        running.add(abort);
        try {
          await runClaimedJob(handler, job, { config, workerName, signal: abort.signal });
        } finally {
          running.delete(abort);
        }
      }
    };
    for (let slot = 0; slot < config.WORKER_CONCURRENCY; slot++) {
      workIds.push(
        await boss.work<JobData>(handler.queue, { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: 1 }, onJobs),
      );
    }
  }
  workIds.push(
    await boss.work<JobData>(
      queues.deadLetter,
      { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: 2 },
      async (jobs) => {
        for (const job of jobs) await failDeadJob(getDb(), job);
      },
    ),
  );
  const reaper = startStaleJobReaper(boss, config);
  // One thread per job slot, started now so the first job does not wait for the engine to load.
  prewarmThreads(config.WORKER_CONCURRENCY * jobHandlers.length);
  logger.info(`Job worker ${workerName} started (${config.WORKER_CONCURRENCY} per queue).`);

  return {
    async stop() {
      reaper.stop();
      for (const id of workIds) await boss.offWork({ id });
      for (const abort of running) abort.abort();
      await closeThreads();
      logger.info(`Job worker ${workerName} stopped.`);
    },
  };
}
