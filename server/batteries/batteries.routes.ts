/** `GET|POST /api/sites/:id/batteries`, `GET|PATCH /api/batteries/:id`. */
import { Router } from 'express';
import { batteryCreateSchema, batteryPatchSchema } from '@shared/schemas/battery';
import { actorFrom, pathId } from '../sites/request-context';
import * as service from './batteries.service';

export const batteriesRouter = Router();

batteriesRouter.get('/sites/:id/batteries', async (req, res) => {
  res.json(await service.listSiteBatteries(pathId(req, 'site')));
});

batteriesRouter.post('/sites/:id/batteries', async (req, res) => {
  const siteId = pathId(req, 'site');
  const input = batteryCreateSchema.parse(req.body);
  res.status(201).json(await service.createBattery(siteId, input, actorFrom(req)));
});

batteriesRouter.get('/batteries/:id', async (req, res) => {
  res.json(await service.getBattery(pathId(req, 'battery')));
});

batteriesRouter.patch('/batteries/:id', async (req, res) => {
  const id = pathId(req, 'battery');
  const patch = batteryPatchSchema.parse(req.body);
  res.json(await service.updateBattery(id, patch, actorFrom(req)));
});
