/**
 * Entry of a worker thread: runs plan and study computations (pure engine
 * work, no database) one at a time as the job sends them, posting progress
 * and the result back.
 */
import { parentPort } from 'node:worker_threads';
import { computePlan, type PlanComputeInput } from '../plans/plan-compute';
import { computeStudy, type StudyComputeInput } from '../studies/study-compute';
import type { ThreadMessage, ThreadRequest } from './thread-protocol';

const post = (message: ThreadMessage) => parentPort?.postMessage(message);
const report = (shareDone: number, message: string | null) => post({ type: 'progress', shareDone, message });

async function run(request: ThreadRequest): Promise<unknown> {
  if (request.task === 'plan') return computePlan(request.input as PlanComputeInput, report);
  return computeStudy(request.input as StudyComputeInput, report);
}

parentPort?.on('message', (request: ThreadRequest) => {
  run(request).then(
    (output) => post({ type: 'done', output }),
    (error: unknown) => post({ type: 'failed', message: error instanceof Error ? error.message : String(error) }),
  );
});
