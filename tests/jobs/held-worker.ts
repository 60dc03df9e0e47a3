/**
 * A worker process for the crash tests: the real worker, except that a claimed job
 * waits (heartbeats running) while the file named by HOLD_FILE exists, so a test can
 * kill the process at a known point without guessing at timing.
 */
import { existsSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';
import { registerJobKinds } from '../../server/job-kinds';
import { runWorkerProcess } from '../../server/jobs/worker-process';

const holdFile = process.env.HOLD_FILE;

registerJobKinds();
runWorkerProcess({
  beforeHandler: async (signal) => {
    while (holdFile && existsSync(holdFile) && !signal.aborted) await sleep(100);
  },
}).catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
