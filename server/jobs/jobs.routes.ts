/** `GET /api/jobs?state=active|…&kind=plan|study`: background jobs with progress, newest first. */
import { Router } from 'express';
import { activeJobStates, jobListQuerySchema, type JobListItem } from '@shared/schemas/job';
import { getDb } from '../db/client';
import { listJobsWithSubjects } from './jobs.repo';
import { toJobProgress } from './job-serializer';

export const jobsRouter = Router();

const day = (value: string | null) => (value ? new Date(value).toISOString().slice(0, 16).replace('T', ' ') : '');

jobsRouter.get('/jobs', async (req, res) => {
  const q = jobListQuerySchema.parse(req.query);
  const states = q.state === 'active' ? activeJobStates : q.state ? [q.state] : undefined;
  const rows = await listJobsWithSubjects(getDb(), {
    ...(states ? { states } : {}),
    ...(q.kind ? { kind: q.kind } : {}),
    limit: q.limit,
  });
  const items: JobListItem[] = rows.map((row) => {
    const what = row.job.kind === 'plan' ? 'Plan' : 'Horizon study';
    const battery = row.batteryName ? ` for ${row.batteryName}` : '';
    return {
      ...toJobProgress(row.job),
      siteId: row.siteId,
      label: `${what}${battery}, ${day(row.periodStart)} – ${day(row.periodEnd)} UTC`,
    };
  });
  res.json(items);
});
