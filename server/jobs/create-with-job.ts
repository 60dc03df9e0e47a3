/**
 * Creates a plan or study row together with its queued job and its audit
 * event, in one transaction: either all three exist afterwards or none.
 */
import { randomUUID } from 'node:crypto';
import type { JobKind } from '@shared/schemas/job';
import type { Db } from '../db/client';
import { insertAuditEvent } from '../audit/audit.repo';
import type { Actor } from '../http/request-context';
import { inJobTransaction } from './job-transaction';
import { enqueueJob, newJobId } from './enqueue';

export interface CreateWithJob {
  kind: JobKind;
  actor: Actor;
  databaseUrl: string;
  /** Inserts the row with the given ids (the row references its job). */
  insert: (tx: Db, ids: { entityId: string; jobId: string }) => Promise<unknown>;
  auditDetails: Record<string, unknown>;
}

export async function createWithJob(c: CreateWithJob): Promise<{ entityId: string; jobId: string }> {
  const ids = { entityId: randomUUID(), jobId: newJobId() };
  await inJobTransaction(async (t) => {
    await enqueueJob(t, c.databaseUrl, { jobId: ids.jobId, kind: c.kind, entityId: ids.entityId, inputVersion: 1 });
    await c.insert(t.tx, ids);
    await insertAuditEvent(t.tx, {
      actorId: c.actor.id,
      actorEmail: c.actor.email,
      ip: c.actor.ip,
      action: `${c.kind}.created`,
      entityType: c.kind,
      entityId: ids.entityId,
      details: { ...c.auditDetails, jobId: ids.jobId },
    });
  });
  return ids;
}
