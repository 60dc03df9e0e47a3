/** `GET /api/jobs?state=active|…&kind=plan|study`: background jobs with progress, newest first. HTTP only. */
import { Router } from 'express';
import { jobListQuerySchema } from '@shared/schemas/job';
import { listJobs } from './jobs.service';

export const jobsRouter = Router();

jobsRouter.get('/jobs', async (req, res) => {
  res.json(await listJobs(jobListQuerySchema.parse(req.query)));
});
