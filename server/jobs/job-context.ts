/**
 * What a job handler gets: its job and attempt, a progress reporter (share done,
 * estimated time left), an abort signal that fires when the attempt must stop
 * (shutdown), and the threads to compute in.
 */
import { getDb } from '../db/client';
import { logger } from '../logger';
import { recordProgress } from './job-progress.repo';
import { runInThread } from './thread-pool';
import type { ReportProgress, ThreadTask } from './thread-task';

/** Progress writes are throttled: the browser polls about once a second. */
const minProgressIntervalMs = 500;

export class JobContext {
  private readonly startedMs = Date.now();
  private lastWriteMs = 0;
  private pending: Promise<void> = Promise.resolve();

  constructor(
    readonly jobId: string,
    readonly attempt: number,
    readonly signal: AbortSignal,
  ) {}

  /** Records the share done (0–1) and an estimate of the time left from the pace so far. */
  report(shareDone: number, message: string | null, force = false): void {
    const now = Date.now();
    if (!force && now - this.lastWriteMs < minProgressIntervalMs) return;
    this.lastWriteMs = now;
    const share = Math.min(1, Math.max(0, Number.isFinite(shareDone) ? shareDone : 0));
    const elapsed = (now - this.startedMs) / 1000;
    // Below 2 % the pace says little; show no estimate rather than a wild one.
    const etaSeconds = share >= 0.02 && share < 1 ? (elapsed * (1 - share)) / share : null;
    this.pending = this.pending
      .then(() => recordProgress(getDb(), this.jobId, this.attempt, { shareDone: share, etaSeconds, message }))
      .catch((error: unknown) => logger.error(`Could not record progress of job ${this.jobId}`, error));
  }

  /** Runs `task` in a worker thread, cancelled with this attempt; the thread's progress goes to `onProgress`. */
  inThread<I, O>(task: ThreadTask<I, O>, input: I, onProgress: ReportProgress): Promise<O> {
    return runInThread(task, input, { signal: this.signal, onProgress });
  }

  /** Waits until every progress write has landed (before the final state is written). */
  async flush(): Promise<void> {
    await this.pending;
  }
}
