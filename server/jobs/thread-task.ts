/**
 * The typed contract between a job and the worker thread that computes for it:
 * one `ThreadTask<I, O>` declaration names the task and fixes its input and
 * output, the job side sends that input (server/jobs/thread-pool.ts) and the
 * thread side implements that function (server/jobs/thread-host.ts), so both
 * are checked against the same types. Only structured-clone data crosses.
 */

export type ReportProgress = (shareDone: number, message: string | null) => void;

export interface ThreadTask<I, O> {
  readonly name: string;
  /** Carries the input and output types; never set. */
  readonly types?: { readonly input: I; readonly output: O };
}

export function threadTask<I, O>(name: string): ThreadTask<I, O> {
  return { name };
}

/** A task's implementation as the thread host runs it. */
export interface TaskImplementation {
  readonly name: string;
  run(input: unknown, report: ReportProgress): Promise<unknown>;
}

/** The thread side of `task`: `run` must take exactly the task's input and give its output. */
export function implement<I, O>(
  task: ThreadTask<I, O>,
  run: (input: I, report: ReportProgress) => Promise<O> | O,
): TaskImplementation {
  // The one place thread data meets its type: the job side sent an `I` for this task's name.
  return { name: task.name, run: async (input, report) => run(input as I, report) };
}

/** Messages between a job and its worker thread. */
export interface ThreadRequest {
  readonly task: string;
  readonly input: unknown;
}

export type ThreadMessage =
  | { readonly type: 'progress'; readonly shareDone: number; readonly message: string | null }
  | { readonly type: 'done'; readonly output: unknown }
  | { readonly type: 'failed'; readonly message: string };
