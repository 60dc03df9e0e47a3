/**
 * Entry of a worker thread: runs one plan or study computation (pure engine
 * work, no database) and posts progress and the result to the job that started it.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { computePlan, type PlanComputeInput } from '../plans/plan-compute';
import { computeStudy, type StudyComputeInput } from '../studies/study-compute';
import type { ThreadMessage, ThreadRequest } from './thread-protocol';

const post = (message: ThreadMessage) => parentPort?.postMessage(message);
const report = (shareDone: number, message: string | null) => post({ type: 'progress', shareDone, message });

async function run(request: ThreadRequest): Promise<unknown> {
  if (request.task === 'plan') return computePlan(request.input as PlanComputeInput, report);
  return computeStudy(request.input as StudyComputeInput, report);
}

run(workerData as ThreadRequest).then(
  (output) => post({ type: 'done', output }),
  (error: unknown) => post({ type: 'failed', message: error instanceof Error ? error.message : String(error) }),
);
