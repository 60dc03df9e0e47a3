/**
 * Creates a plan or study row together with its queued job and its audit
 * event, in one transaction: either all three exist afterwards or none.
 */
import { randomUUID } from 'node:crypto';
import type { JobKind, JobProgress } from '@shared/schemas/job';
import { getDb, type Db } from '../db/client';
import { recordAudit } from '../audit/audit.service';
import type { Actor } from '../http/request-context';
import { inJobTransaction } from '../jobs/job-transaction';
import { enqueueJob, newJobId } from '../jobs/enqueue';
import { getJobProgress } from '../jobs/job-progress.repo';
import { toJobProgress } from '../jobs/job-serializer';
import type { RunJobRow } from './run-columns';

export interface NewRun {
  kind: JobKind;
  actor: Actor;
  databaseUrl: string;
  /** Inserts the row with the given ids (the row references its job). */
  insert: (tx: Db, ids: { entityId: string; jobId: string }) => Promise<unknown>;
  auditDetails: Record<string, unknown>;
}

export async function createRunWithJob(c: NewRun): Promise<{ entityId: string; jobId: string }> {
  const ids = { entityId: randomUUID(), jobId: newJobId() };
  await inJobTransaction(async (t) => {
    await enqueueJob(t, c.databaseUrl, { jobId: ids.jobId, kind: c.kind, entityId: ids.entityId, inputVersion: 1 });
    await c.insert(t.tx, ids);
    await recordAudit(t.tx, c.actor, {
      action: `${c.kind}.created`,
      entityType: c.kind,
      entityId: ids.entityId,
      details: { ...c.auditDetails, jobId: ids.jobId },
    });
  });
  return ids;
}

/** The job's progress as the API shows it, read now. */
export async function runJob(jobId: string): Promise<JobProgress> {
  const row = await getJobProgress(getDb(), jobId);
  if (!row) throw new Error(`job ${jobId} vanished after commit`);
  return toJobProgress(row);
}

/** A run row's joined job, as the API shows it. */
export const runJobOf = (row: RunJobRow | null): JobProgress | null => (row ? toJobProgress(row) : null);
