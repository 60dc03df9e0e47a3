/**
 * Runs CPU-heavy tasks in worker threads, so the process's event loop (the
 * HTTP server, heartbeats, progress writes) stays responsive while it solves.
 * Threads are kept between tasks: starting one costs seconds under tsx (it
 * loads the engine and its WebAssembly solvers), a task often much less. A
 * cancelled or failed task's thread is terminated, never reused. Threads start
 * on the entry the composition root named (useThreadEntry), through the one
 * thread bootstrap (server/engine/threads/worker-thread.ts).
 */
import type { Worker } from 'node:worker_threads';
import { startWorkerThread } from '../engine/threads/worker-thread';
import type { ThreadMessage, ThreadRequest, ThreadTask } from './thread-task';

let entry: URL | null = null;

/** Names the module every job thread starts on (it serves the tasks of every registered job kind). */
export function useThreadEntry(url: URL): void {
  entry = url;
}

function startWorker(): Worker {
  if (!entry) throw new Error('No job thread entry is registered: register the job kinds at start-up (server/job-kinds.ts).');
  return startWorkerThread(entry);
}

const idle: Worker[] = [];
let maxIdle = 1;

/** An idle thread that dies (e.g. its code failed to load) leaves the pool instead of swallowing the next task. */
function dropWhenDead(this: Worker) {
  const i = idle.indexOf(this);
  if (i >= 0) idle.splice(i, 1);
}

function park(worker: Worker): void {
  worker.unref();
  worker.on('error', dropWhenDead).on('exit', dropWhenDead);
  idle.push(worker);
}

function takeIdle(): Worker | undefined {
  const worker = idle.pop();
  worker?.off('error', dropWhenDead).off('exit', dropWhenDead);
  return worker;
}

/** Starts `count` threads ahead of the first task (a worker process calls this at start). */
export function prewarmThreads(count: number): void {
  maxIdle = Math.max(maxIdle, count);
  while (idle.length < count) park(startWorker());
}

/** Ends every idle thread (shutdown). Busy ones end with their task. */
export async function closeThreads(): Promise<void> {
  await Promise.all(idle.splice(0).map((w) => w.terminate()));
}

export interface ThreadOptions {
  onProgress?: (shareDone: number, message: string | null) => void;
  signal?: AbortSignal;
}

export class ThreadTaskError extends Error {
  override name = 'ThreadTaskError';
}

/** Runs `task` on `input` in a thread; the output has the task's declared type. */
export function runInThread<I, O>(task: ThreadTask<I, O>, input: I, options: ThreadOptions = {}): Promise<O> {
  const request: ThreadRequest = { task: task.name, input };
  return new Promise<O>((resolve, reject) => {
    if (options.signal?.aborted) {
      reject(new ThreadTaskError('The task was cancelled before it started.'));
      return;
    }
    const worker = takeIdle() ?? startWorker();
    worker.ref();
    let settled = false;
    const settle = (reuse: boolean, fn: () => void) => {
      if (settled) return;
      settled = true;
      options.signal?.removeEventListener('abort', onAbort);
      worker.off('message', onMessage);
      worker.off('error', onError);
      worker.off('exit', onExit);
      if (reuse && idle.length < maxIdle) {
        park(worker);
      } else {
        void worker.terminate();
      }
      fn();
    };
    const onAbort = () => settle(false, () => reject(new ThreadTaskError('The task was cancelled.')));
    const onMessage = (message: ThreadMessage) => {
      if (message.type === 'progress') options.onProgress?.(message.shareDone, message.message);
      else if (message.type === 'done') settle(true, () => resolve(message.output as O));
      else settle(false, () => reject(new ThreadTaskError(message.message)));
    };
    const onError = (error: Error) =>
      settle(false, () => reject(new ThreadTaskError(`The computation stopped: ${error.message}`)));
    const onExit = (code: number) =>
      settle(false, () => reject(new ThreadTaskError(`The computation thread ended without a result (exit code ${code}).`)));
    options.signal?.addEventListener('abort', onAbort);
    worker.on('message', onMessage);
    worker.on('error', onError);
    worker.on('exit', onExit);
    worker.postMessage(request);
  });
}
