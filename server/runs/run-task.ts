/**
 * The typed contract of a run's computation in a worker thread: the snapshot
 * and its profile values go in, the results to store (or the engine's message
 * when the model cannot be solved) come out. Plans and studies each declare
 * one task with their own input and results; the job sends exactly that input
 * and the thread implements exactly that function (server/solve-thread.ts).
 */
import { threadTask, type ReportProgress, type ThreadTask } from '../jobs/thread-task';
import type { SnapshotSeries } from './profile-series';

export type { ReportProgress };

/** What a computation gives back: results to store, or why the model cannot be solved (no retry fixes that). */
export type ComputeOutcome<R> = { ok: true; results: R } | { ok: false; message: string };

/** The input every run computation starts from: its inputs snapshot and the profile values it names. */
export type RunComputeInput<Inputs> = SnapshotSeries & { readonly inputs: Inputs };

export type RunTask<Input, Results> = ThreadTask<Input, ComputeOutcome<Results>>;

export function runTask<Input extends RunComputeInput<unknown>, Results>(name: string): RunTask<Input, Results> {
  return threadTask<Input, ComputeOutcome<Results>>(name);
}
