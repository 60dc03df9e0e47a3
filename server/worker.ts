/**
 * `npm run worker`: a background-job worker process and nothing else. Start as
 * many as you like, on any machine that reaches the database (DATABASE_URL);
 * pg-boss hands each job to one of them, and a worker that dies mid-job has
 * its job taken over by another (heartbeats in job_progress).
 */
import { registerJobKinds } from './job-kinds';
import { runWorkerProcess } from './jobs/worker-process';

registerJobKinds();
runWorkerProcess().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
