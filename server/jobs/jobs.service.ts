/** The job list of the attention page: progress rows with what each job computes, newest first. */
import { activeJobStates, type JobListItem, type JobListQuery } from '@shared/schemas/job';
import { getDb } from '../db/client';
import { registeredHandlers } from './job-registry';
import { listJobProgress } from './job-progress.repo';
import { toJobProgress } from './job-serializer';
import type { JobSubject } from './job-types';

export async function listJobs(q: JobListQuery): Promise<JobListItem[]> {
  const db = getDb();
  const states = q.state === 'active' ? activeJobStates : q.state ? [q.state] : undefined;
  const rows = await listJobProgress(db, { ...(states ? { states } : {}), ...(q.kind ? { kind: q.kind } : {}), limit: q.limit });
  const subjects = new Map<string, JobSubject>();
  for (const handler of registeredHandlers()) {
    const ids = rows.filter((row) => row.kind === handler.kind).map((row) => row.entityId);
    if (ids.length === 0) continue;
    for (const [id, subject] of await handler.describe(db, ids)) subjects.set(`${handler.kind}:${id}`, subject);
  }
  return rows.map((row) => {
    const subject = subjects.get(`${row.kind}:${row.entityId}`);
    return { ...toJobProgress(row), siteId: subject?.siteId ?? null, label: subject?.label ?? `A ${row.kind} job` };
  });
}
