/** The only place that reads and writes job_progress. */
import { and, desc, eq, inArray, lt, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { jobProgress, type JobProgressRow } from './jobs.schema';
import type { JobKind, JobState } from '@shared/schemas/job';

export async function insertQueuedJob(db: DbOrTx, row: { jobId: string; queue: string; kind: JobKind; entityId: string }) {
  await db.insert(jobProgress).values({ ...row, state: 'queued', message: 'Waiting for a worker.' });
}

/** Claims the row for an attempt; returns false when a newer attempt already owns it. */
export async function markJobRunning(db: DbOrTx, jobId: string, attempt: number, worker: string): Promise<boolean> {
  const rows = await db
    .update(jobProgress)
    .set({
      state: 'running',
      attempt,
      worker,
      shareDone: 0,
      etaSeconds: null,
      message: attempt > 1 ? `Started again (attempt ${attempt}).` : 'Started.',
      heartbeatAt: sql`now()`,
      startedAt: sql`coalesce(${jobProgress.startedAt}, now())`,
      updatedAt: sql`now()`,
    })
    .where(
      and(
        eq(jobProgress.jobId, jobId),
        lt(jobProgress.attempt, attempt),
        inArray(jobProgress.state, ['queued', 'running', 'retrying']),
      ),
    )
    .returning({ jobId: jobProgress.jobId });
  return rows.length === 1;
}

export async function recordHeartbeat(db: DbOrTx, jobId: string, attempt: number): Promise<void> {
  await db
    .update(jobProgress)
    .set({ heartbeatAt: sql`now()` })
    .where(and(eq(jobProgress.jobId, jobId), eq(jobProgress.attempt, attempt), eq(jobProgress.state, 'running')));
}

export async function recordProgress(
  db: DbOrTx,
  jobId: string,
  attempt: number,
  update: { shareDone: number; etaSeconds: number | null; message: string | null },
): Promise<void> {
  await db
    .update(jobProgress)
    .set({ ...update, heartbeatAt: sql`now()`, updatedAt: sql`now()` })
    .where(and(eq(jobProgress.jobId, jobId), eq(jobProgress.attempt, attempt), eq(jobProgress.state, 'running')));
}

/** Final states. `attempt` null = whichever attempt is current (dead-letter handling). */
export async function finishJob(
  db: DbOrTx,
  jobId: string,
  attempt: number | null,
  outcome: { state: Extract<JobState, 'completed' | 'failed'>; message: string; error?: string | null },
): Promise<boolean> {
  const rows = await db
    .update(jobProgress)
    .set({
      state: outcome.state,
      message: outcome.message,
      error: outcome.error ?? null,
      shareDone: outcome.state === 'completed' ? 1 : sql`${jobProgress.shareDone}`,
      etaSeconds: null,
      finishedAt: sql`now()`,
      updatedAt: sql`now()`,
    })
    .where(
      and(
        eq(jobProgress.jobId, jobId),
        attempt === null ? undefined : eq(jobProgress.attempt, attempt),
        inArray(jobProgress.state, ['queued', 'running', 'retrying']),
      ),
    )
    .returning({ jobId: jobProgress.jobId });
  return rows.length === 1;
}

/** Returns false when the attempt is no longer the running one (another worker or reaper moved on). */
export async function markJobRetrying(
  db: DbOrTx,
  jobId: string,
  attempt: number,
  outcome: { error: string; message: string },
): Promise<boolean> {
  const rows = await db
    .update(jobProgress)
    .set({ state: 'retrying', error: outcome.error, message: outcome.message, etaSeconds: null, updatedAt: sql`now()` })
    .where(and(eq(jobProgress.jobId, jobId), eq(jobProgress.attempt, attempt), eq(jobProgress.state, 'running')))
    .returning({ jobId: jobProgress.jobId });
  return rows.length === 1;
}

/**
 * A running attempt given back unspent (its worker is shutting down): the row is
 * queued again one attempt lower, so the next claim counts the same attempt.
 */
export async function markJobHandedBack(db: DbOrTx, jobId: string, attempt: number, message: string): Promise<boolean> {
  const rows = await db
    .update(jobProgress)
    .set({
      state: 'queued',
      attempt: attempt - 1,
      worker: null,
      shareDone: 0,
      etaSeconds: null,
      message,
      updatedAt: sql`now()`,
    })
    .where(and(eq(jobProgress.jobId, jobId), eq(jobProgress.attempt, attempt), eq(jobProgress.state, 'running')))
    .returning({ jobId: jobProgress.jobId });
  return rows.length === 1;
}

/** Running (or retrying) jobs whose worker has not sent a heartbeat for `staleSeconds`. */
export async function findStaleJobs(db: DbOrTx, staleSeconds: number): Promise<JobProgressRow[]> {
  return db
    .select()
    .from(jobProgress)
    .where(
      and(
        inArray(jobProgress.state, ['running', 'retrying']),
        lt(jobProgress.heartbeatAt, sql`now() - make_interval(secs => ${staleSeconds})`),
      ),
    );
}

export async function getJobProgress(db: DbOrTx, jobId: string): Promise<JobProgressRow | undefined> {
  const [row] = await db.select().from(jobProgress).where(eq(jobProgress.jobId, jobId));
  return row;
}

export async function listJobProgress(db: DbOrTx, filter: { states?: readonly JobState[]; kind?: JobKind; limit: number }) {
  return db
    .select()
    .from(jobProgress)
    .where(
      and(
        filter.states ? inArray(jobProgress.state, [...filter.states]) : undefined,
        filter.kind ? eq(jobProgress.kind, filter.kind) : undefined,
      ),
    )
    .orderBy(desc(jobProgress.createdAt))
    .limit(filter.limit);
}
