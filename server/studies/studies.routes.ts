/** `POST /api/studies` → 202 {study, job}, `GET /api/studies?siteId=&status=`, `GET /api/studies/:id`. HTTP only. */
import { Router } from 'express';
import { studyCreateSchema, studyListQuerySchema } from '@shared/schemas/study';
import { appConfig } from '../auth/current-user';
import { actorOf, pathId } from '../http/request-context';
import * as service from './studies.service';

export const studiesRouter = Router();

studiesRouter.post('/studies', async (req, res) => {
  const body = studyCreateSchema.parse(req.body);
  res.status(202).json(await service.createStudy(body, actorOf(req), appConfig(req).DATABASE_URL));
});

studiesRouter.get('/studies', async (req, res) => {
  res.json(await service.listStudySummaries(studyListQuerySchema.parse(req.query)));
});

studiesRouter.get('/studies/:id', async (req, res) => {
  res.json(await service.getStudy(pathId(req, 'horizon study')));
});
