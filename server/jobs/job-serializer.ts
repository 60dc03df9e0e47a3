import type { JobProgress } from '@shared/schemas/job';
import type { JobProgressRow } from './jobs.schema';

const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

export function toJobProgress(row: JobProgressRow): JobProgress {
  return {
    id: row.jobId,
    kind: row.kind,
    entityId: row.entityId,
    state: row.state,
    shareDone: row.shareDone,
    etaSeconds: row.etaSeconds,
    message: row.message,
    error: row.error,
    attempt: row.attempt,
    createdAt: row.createdAt.toISOString(),
    startedAt: isoOrNull(row.startedAt),
    finishedAt: isoOrNull(row.finishedAt),
    updatedAt: row.updatedAt.toISOString(),
  };
}
