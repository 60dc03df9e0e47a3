/**
 * The body of a job thread's entry: runs the tasks it was given one at a time
 * as jobs send them, posting progress and the result back. The entry itself
 * (server/solve-thread.ts) says which tasks a thread can run.
 */
import { parentPort } from 'node:worker_threads';
import type { TaskImplementation, ThreadMessage, ThreadRequest } from './thread-task';

const post = (message: ThreadMessage) => parentPort?.postMessage(message);
const report = (shareDone: number, message: string | null) => post({ type: 'progress', shareDone, message });

export function serveThreadTasks(tasks: readonly TaskImplementation[]): void {
  const byName = new Map(tasks.map((task) => [task.name, task]));
  parentPort?.on('message', (request: ThreadRequest) => {
    const task = byName.get(request.task);
    const run = task ? task.run(request.input, report) : Promise.reject(new Error(`this thread has no task "${request.task}"`));
    run.then(
      (output) => post({ type: 'done', output }),
      (error: unknown) => post({ type: 'failed', message: error instanceof Error ? error.message : String(error) }),
    );
  });
}
