/**
 * The end of a successful attempt: the results (written only if none are
 * stored yet for this entity and input version), the job's final state and an
 * audit event, in one transaction. A second attempt finds them stored and only
 * finishes its job.
 */
import { getDb, type DbOrTx } from '../db/client';
import { insertAuditEvent } from '../audit/audit.repo';
import type { JobContext } from './job-context';
import { finishJob } from './job-progress.repo';
import type { JobData } from './job-types';

export async function storeResultsOnce(
  ctx: JobContext,
  data: JobData,
  what: { label: string; method: string; store: (tx: DbOrTx) => Promise<boolean> },
): Promise<void> {
  await ctx.flush();
  await getDb().transaction(async (tx) => {
    const stored = await what.store(tx);
    await finishJob(tx, data.jobId, ctx.attempt, {
      state: 'completed',
      message: stored ? `${what.label} computed.` : `${what.label} was already computed.`,
    });
    if (!stored) return;
    await insertAuditEvent(tx, {
      action: `${data.kind}.computed`,
      entityType: data.kind,
      entityId: data.entityId,
      details: { jobId: data.jobId, attempt: ctx.attempt, inputVersion: data.inputVersion, method: what.method },
    });
  });
}
