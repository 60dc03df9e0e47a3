/**
 * Runs independent closed-loop runs on worker threads (one per core by default).
 * Under tsx (development, tests, the CLI) a worker cannot load a .ts file by
 * itself on Node 20 (ERR_UNKNOWN_FILE_EXTENSION, STACK.md), so it is bootstrapped
 * with an eval that registers tsx first; a bundle or compiled build loads its own file directly.
 */
import { availableParallelism } from 'node:os';
import { createRequire } from 'node:module';
import { dirname, extname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { StudyJob, StudyJobContext } from './study-job';

function spawnWorker(): Worker {
  // The worker sits next to this module with the same extension: .ts under tsx,
  // .mjs in the command-line bundle (scripts/cli-bundle.mjs), .js in a compiled build.
  const extension = extname(new URL(import.meta.url).pathname);
  const entry = new URL(`./study-worker${extension}`, import.meta.url);
  if (extension !== '.ts') return new Worker(entry);
  // The ESM build of tsx's API (its package exports map "tsx/esm/api" to it for import).
  const tsxDir = dirname(createRequire(import.meta.url).resolve('tsx/package.json'));
  const tsxApi = pathToFileURL(join(tsxDir, 'dist/esm/api/index.mjs')).href;
  const bootstrap = `import(${JSON.stringify(tsxApi)}).then((api) => { api.register(); return import(${JSON.stringify(entry.href)}); });`;
  return new Worker(bootstrap, { eval: true });
}

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
