/**
 * Queues a job inside the caller's transaction: the progress row and the
 * pg-boss job commit with the entity row that needs them.
 */
import { randomUUID } from 'node:crypto';
import { ensureBoss } from './boss';
import { handlerOf } from './job-registry';
import { insertQueuedJob } from './job-progress.repo';
import type { JobTransaction } from './job-transaction';
import type { JobData } from './job-types';

/** A fresh job id, known before the entity row is written (it references the job). */
export function newJobId(): string {
  return randomUUID();
}

export async function enqueueJob(t: JobTransaction, databaseUrl: string, data: JobData): Promise<void> {
  const { queue } = handlerOf(data.kind);
  const boss = await ensureBoss(databaseUrl);
  await insertQueuedJob(t.tx, { jobId: data.jobId, queue, kind: data.kind, entityId: data.entityId });
  const sent = await boss.send(queue, { ...data }, { id: data.jobId, db: t.bossDb });
  if (sent !== data.jobId) throw new Error(`pg-boss did not accept job ${data.jobId}`);
}
