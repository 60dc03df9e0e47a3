/**
 * `npm run worker`: a background-job worker process and nothing else. Start as
 * many as you like, on any machine that reaches the database (DATABASE_URL);
 * pg-boss hands each job to one of them, and a worker that dies mid-job has
 * its job taken over by another (heartbeats in job_progress).
 */
import { loadConfig } from './config';
import { closeDb, initDb } from './db/client';
import { logger } from './logger';
import { startJobWorker } from './jobs/job-worker';
import { stopBoss } from './jobs/boss';
import { loadJobsConfig } from './jobs/jobs-config';

async function main() {
  const config = loadConfig();
  const jobs = loadJobsConfig();
  initDb(config.DATABASE_URL, 4);
  const worker = await startJobWorker(config.DATABASE_URL, jobs);
  // A line for whoever starts us (scripts, tests) to know we are taking jobs.
  console.log(`worker ready pid=${process.pid}`);

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    logger.info('Stopping the job worker…');
    await worker.stop();
    await stopBoss();
    await closeDb();
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
