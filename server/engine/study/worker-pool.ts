/**
 * Runs independent closed-loop runs on worker threads (one per core by default),
 * started by the one thread bootstrap (../threads/worker-thread.ts) on
 * `./study-worker` next to this module.
 */
import { availableParallelism } from 'node:os';
import { siblingEntry, startWorkerThread } from '../threads/worker-thread';
import type { StudyJob, StudyJobContext } from './study-job';

const spawnWorker = () => startWorkerThread(siblingEntry(import.meta.url, 'study-worker'));

export function defaultWorkerCount(): number {
  return Math.max(1, Math.min(4, availableParallelism()));
}

/**
 * Runs `jobs` over `workers` threads; results come back in job order. Jobs go out
 * longest first (by horizon) so the threads finish close together.
 */
export async function runJobsOnWorkers<R>(
  context: StudyJobContext,
  jobs: readonly StudyJob[],
  workers: number,
  onResult?: (result: R, done: number) => void,
): Promise<R[]> {
  const order = jobs.map((job, index) => ({ job, index })).sort((a, b) => b.job.horizonSteps - a.job.horizonSteps);
  const results = new Array<R>(jobs.length);
  let next = 0;
  let done = 0;
  const threads = Array.from({ length: Math.min(workers, jobs.length) }, spawnWorker);
  try {
    await Promise.all(
      threads.map(
        (thread) =>
          new Promise<void>((resolve, reject) => {
            const sendNext = () => {
              const item = order[next++];
              if (!item) return resolve();
              thread.postMessage({ index: item.index, job: item.job });
            };
            thread.on('message', (message: { index: number; result: R }) => {
              results[message.index] = message.result;
              onResult?.(message.result, ++done);
              sendNext();
            });
            thread.on('error', reject);
            thread.postMessage({ context });
            sendNext();
          }),
      ),
    );
  } finally {
    await Promise.all(threads.map((t) => t.terminate()));
  }
  return results;
}
