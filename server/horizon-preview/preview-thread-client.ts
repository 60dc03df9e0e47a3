/**
 * The web process's side of the preview thread: one long-lived worker thread
 * that solves previews in arrival order while the event loop keeps answering
 * other requests. The thread keeps the aligned profiles of recent plans; the
 * database stays here, and the profile values cross over only when the thread
 * asks for them. Started on first use (through the one thread bootstrap,
 * server/engine/threads/worker-thread.ts); a thread that dies fails the
 * previews it held and the next preview starts a new one.
 */
import type { Worker } from 'node:worker_threads';
import { siblingEntry, startWorkerThread } from '../engine/threads/worker-thread';
import type { PlanInputs } from '@shared/schemas/plan';
import { AppError } from '../http/app-error';
import { logger } from '../logger';
import type { SnapshotSeries } from '../runs/profile-series';
import type { PreviewReply, PreviewRequest } from './preview-protocol';
import type { PreviewFigures } from './preview-solve';

/** A busy thread answers this rather than letting previews pile up behind a slow one. */
export class PreviewBusyError extends AppError {
  constructor(
    readonly retryAfterSeconds: number,
    message: string,
  ) {
    super('preview_busy', message, 503);
  }
}

const spawnPreviewThread = (): Worker => startWorkerThread(siblingEntry(import.meta.url, 'preview-thread'));

type Answer = PreviewFigures | 'miss';

interface Waiting {
  resolve(answer: Answer): void;
  reject(error: Error): void;
}

export interface PreviewJob {
  /** Names the snapshot (plan id and input version): the thread's cache key. */
  readonly key: string;
  readonly inputs: PlanInputs;
  readonly horizonHours: number;
  /** Reads the snapshot's profile values, called only when the thread has not kept them. */
  readonly loadSeries: () => Promise<SnapshotSeries>;
}

const FIRST_PAUSE_MS = 1000;
const LONGEST_PAUSE_MS = 60_000;

export class PreviewThread {
  private worker: Worker | null = null;
  private readonly waiting = new Map<number, Waiting>();
  private nextId = 1;
  private active = 0;
  /** Crashes since the thread last answered anything, and when the next may start. */
  private crashes = 0;
  private restartAt = 0;

  /**
   * `maxPending`: previews accepted at once (computing or queued); one more is answered 503.
   * `spawn`: starts the thread (tests hand in threads that misbehave).
   */
  constructor(
    private readonly maxPending = 8,
    private readonly spawn: () => Worker = spawnPreviewThread,
  ) {}

  /** Previews accepted and not yet answered. */
  get pending(): number {
    return this.active;
  }

  /** Starts the thread ahead of the first preview (it loads the engine, which takes a moment under tsx). */
  warm(): void {
    this.thread();
  }

  async run(job: PreviewJob): Promise<PreviewFigures> {
    if (this.active >= this.maxPending) {
      throw new PreviewBusyError(
        1,
        `The preview is busy: ${this.active} previews are being computed or wait their turn. Wait a second and move the slider again.`,
      );
    }
    const pauseMs = this.worker ? 0 : this.restartAt - Date.now();
    if (pauseMs > 0) {
      const seconds = Math.ceil(pauseMs / 1000);
      throw new PreviewBusyError(
        seconds,
        `The horizon preview stopped after a failure (logged) and restarts in ${seconds} s. Try again then, or make a full plan with this horizon: it runs in the background.`,
      );
    }
    this.active++;
    try {
      const request = { key: job.key, inputs: job.inputs, horizonHours: job.horizonHours };
      const first = await this.ask(request);
      if (first !== 'miss') return first;
      const second = await this.ask({ ...request, series: await job.loadSeries() });
      if (second === 'miss') throw new Error('the preview thread asked again for profiles it was just sent');
      return second;
    } finally {
      this.active--;
    }
  }

  /** Ends the thread (server shutdown); previews still waiting are answered 503. */
  async close(): Promise<void> {
    const worker = this.worker;
    if (!worker) return;
    this.ended(worker, null);
    await worker.terminate();
  }

  private thread(): Worker {
    if (this.worker) return this.worker;
    const worker = this.spawn();
    // An idle thread must not keep a process (a test run, a script) alive; open requests keep their sockets.
    worker.unref();
    worker.on('message', (reply: PreviewReply) => this.settle(reply));
    worker.on('error', (error) => this.ended(worker, error));
    worker.on('exit', (code) => this.ended(worker, new Error(`exit code ${code}`)));
    this.worker = worker;
    return worker;
  }

  private ask(request: Omit<PreviewRequest, 'id'>): Promise<Answer> {
    const worker = this.thread();
    const id = this.nextId++;
    return new Promise<Answer>((resolve, reject) => {
      this.waiting.set(id, { resolve, reject });
      const message: PreviewRequest = { id, ...request };
      worker.postMessage(message);
    });
  }

  private settle(reply: PreviewReply): void {
    const waiting = this.waiting.get(reply.id);
    this.crashes = 0; // it answers: it loaded and works
    if (!waiting) return;
    this.waiting.delete(reply.id);
    if (reply.type === 'miss') waiting.resolve('miss');
    else if (reply.type === 'done') waiting.resolve(reply.preview);
    else if (reply.type === 'refused') {
      const { code, message, status, issues, extra } = reply.refusal;
      waiting.reject(new AppError(code, message, status, issues, extra));
    } else {
      logger.error('The horizon preview failed in its thread', reply.message);
      waiting.reject(
        new AppError(
          'preview_failed',
          'The horizon preview could not be computed for this plan (the problem was logged). Make a full plan with this horizon instead: it runs in the background.',
          500,
        ),
      );
    }
  }

  /** The thread ended (shutdown when `error` is null): whatever it held is answered, and the next preview starts a new one. */
  private ended(worker: Worker, error: Error | null): void {
    if (this.worker !== worker) return;
    this.worker = null;
    if (error) {
      this.crashes++;
      const pauseMs = Math.min(LONGEST_PAUSE_MS, FIRST_PAUSE_MS * 2 ** (this.crashes - 1));
      this.restartAt = Date.now() + pauseMs;
      logger.error(
        `The horizon preview thread stopped (${this.crashes} in a row); a new one starts with a preview after ${pauseMs / 1000} s`,
        error,
      );
    }
    const held = [...this.waiting.values()];
    this.waiting.clear();
    for (const w of held)
      w.reject(new PreviewBusyError(1, 'The horizon preview stopped while computing. Move the slider again in a second.'));
  }
}

/** The web process's one preview thread. */
export const previewThread = new PreviewThread();
