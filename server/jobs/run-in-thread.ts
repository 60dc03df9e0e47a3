/**
 * Runs one CPU-heavy task in a worker thread, so the process's event loop (the
 * HTTP server, heartbeats, progress writes) stays responsive while it solves.
 * One thread per task: terminating it is a clean cancel and frees its memory.
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

function startWorker(request: ThreadRequest): Worker {
  if (!entryUrl.pathname.endsWith('.ts')) return new Worker(entryUrl, { workerData: request });
  const bootstrap = `import(${JSON.stringify(tsxLoaderUrl())}).then((api) => { api.register(); return import(${JSON.stringify(entryUrl.href)}); });`;
  return new Worker(bootstrap, { eval: true, workerData: request });
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
    const worker = startWorker(request);
    let settled = false;
    const settle = (fn: () => void) => {
      if (settled) return;
      settled = true;
      options.signal?.removeEventListener('abort', onAbort);
      fn();
      void worker.terminate();
    };
    const onAbort = () => settle(() => reject(new ThreadTaskError('The task was cancelled.')));
    options.signal?.addEventListener('abort', onAbort);

    worker.on('message', (message: ThreadMessage) => {
      if (message.type === 'progress') options.onProgress?.(message.shareDone, message.message);
      else if (message.type === 'done') settle(() => resolve(message.output as O));
      else settle(() => reject(new ThreadTaskError(message.message)));
    });
    worker.on('error', (error) => settle(() => reject(new ThreadTaskError(`The computation stopped: ${error.message}`))));
    worker.on('exit', (code) =>
      settle(() => reject(new ThreadTaskError(`The computation thread ended without a result (exit code ${code}).`))),
    );
  });
}
