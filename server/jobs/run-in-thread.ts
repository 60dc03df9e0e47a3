/**
 * Runs CPU-heavy tasks in worker threads, so the process's event loop (the
 * HTTP server, heartbeats, progress writes) stays responsive while it solves.
 * Threads are kept between tasks: starting one costs seconds under tsx (it
 * loads the engine and its WebAssembly solvers), a task often much less. A
 * cancelled or failed task's thread is terminated, never reused.
 *
 * Under tsx on Node 20 a worker thread cannot load TypeScript by itself
 * (ERR_UNKNOWN_FILE_EXTENSION), so the thread starts from a small eval that
 * registers tsx's ESM loader first, then imports the entry.
 */
import { Worker } from 'node:worker_threads';
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import type { ThreadMessage, ThreadRequest } from './thread-protocol';

const entryUrl = new URL(`./solve-thread${import.meta.url.endsWith('.ts') ? '.ts' : '.js'}`, import.meta.url);

function tsxLoaderUrl(): string {
  const resolved = createRequire(import.meta.url).resolve('tsx/esm/api');
  return pathToFileURL(resolved.replace(/\.cjs$/, '.mjs')).href;
}

function startWorker(): Worker {
  if (!entryUrl.pathname.endsWith('.ts')) return new Worker(entryUrl);
  const bootstrap = `import(${JSON.stringify(tsxLoaderUrl())}).then((api) => { api.register(); return import(${JSON.stringify(entryUrl.href)}); });`;
  return new Worker(bootstrap, { eval: true });
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

export function runInThread<O>(request: ThreadRequest, options: ThreadOptions = {}): Promise<O> {
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
