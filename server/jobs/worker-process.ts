/**
 * The body of a worker process (`npm run worker`): connect, take jobs, say so on
 * stdout, and stop cleanly on SIGINT or SIGTERM.
 */
import { loadConfig } from '../config';
import { closeDb, initDb } from '../db/client';
import { logger } from '../logger';
import { startJobWorker } from './job-worker';
import { stopBoss } from './boss';
import { loadJobsConfig, type JobsConfig } from './jobs-config';

export async function runWorkerProcess(overrides: Partial<JobsConfig> = {}): Promise<void> {
  const config = loadConfig();
  const jobs = { ...loadJobsConfig(), ...overrides };
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
