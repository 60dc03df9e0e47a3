/** `GET|POST /api/sites`, `GET|PATCH /api/sites/:id`. HTTP only: rules live in the service. */
import { Router } from 'express';
import { siteCreateSchema, sitePatchSchema } from '@shared/schemas/site';
import { actorOf, pathId } from '../http/request-context';
import * as service from './sites.service';

export const sitesRouter = Router();

sitesRouter.get('/sites', async (_req, res) => {
  res.json(await service.listSites());
});

sitesRouter.post('/sites', async (req, res) => {
  const fields = siteCreateSchema.parse(req.body);
  res.status(201).json(await service.createSite(fields, actorOf(req)));
});

sitesRouter.get('/sites/:id', async (req, res) => {
  res.json(await service.getSite(pathId(req, 'site')));
});

sitesRouter.patch('/sites/:id', async (req, res) => {
  const id = pathId(req, 'site');
  const patch = sitePatchSchema.parse(req.body);
  res.json(await service.updateSite(id, patch, actorOf(req)));
});
