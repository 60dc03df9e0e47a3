/**
 * The background jobs of Slackwater, registered with the generic job runner by
 * every process that queues or works them (server/app.ts, server/worker.ts):
 * plans and horizon studies, each computed by the run kernel's one handler,
 * in threads started on server/solve-thread.ts.
 */
import { siblingEntry } from './engine/threads/worker-thread';
import { registerJobHandler } from './jobs/job-registry';
import { useThreadEntry } from './jobs/thread-pool';
import { planRun } from './plans/plan-run';
import { runJobHandler } from './runs/run-job-handler';
import { studyRun } from './studies/study-run';

export function registerJobKinds(): void {
  registerJobHandler(runJobHandler(planRun));
  registerJobHandler(runJobHandler(studyRun));
  useThreadEntry(siblingEntry(import.meta.url, 'solve-thread'));
}
