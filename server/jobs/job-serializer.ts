import type { JobProgress } from '@shared/schemas/job';
import { WORKER_LOST } from './job-messages';
import { jobsConfig } from './jobs-config';
import type { JobProgressRow } from './jobs.schema';

const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

/**
 * A running job whose heartbeat is older than JOB_STALE_SECONDS has lost its
 * worker, whether or not another worker has noticed yet: it is shown waiting
 * to resume, with no time left to promise.
 */
function lostWorker(row: JobProgressRow, nowMs: number): boolean {
  if (row.state !== 'running' || !row.heartbeatAt) return false;
  return nowMs - row.heartbeatAt.getTime() > jobsConfig().JOB_STALE_SECONDS * 1000;
}

export function toJobProgress(row: JobProgressRow, nowMs = Date.now()): JobProgress {
  const lost = lostWorker(row, nowMs);
  return {
    id: row.jobId,
    kind: row.kind,
    entityId: row.entityId,
    state: lost ? 'retrying' : row.state,
    shareDone: row.shareDone,
    etaSeconds: lost ? null : row.etaSeconds,
    message: lost ? WORKER_LOST : row.message,
    error: row.error,
    attempt: row.attempt,
    createdAt: row.createdAt.toISOString(),
    startedAt: isoOrNull(row.startedAt),
    finishedAt: isoOrNull(row.finishedAt),
    updatedAt: row.updatedAt.toISOString(),
  };
}
