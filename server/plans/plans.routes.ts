/**
 * `POST /api/plans` → 202 {plan, job}, `GET /api/plans?siteId=&status=…`,
 * `GET /api/plans/:id`, and the plan form's defaults for a
 * battery. HTTP only: rules live in the service.
 */
import { Router } from 'express';
import { z } from 'zod';
import { planCreateSchema, planListQuerySchema } from '@shared/schemas/plan';
import { appConfig } from '../auth/current-user';
import { actorOf, pathId } from '../http/request-context';
import * as service from './plans.service';

export const plansRouter = Router();

plansRouter.post('/plans', async (req, res) => {
  const body = planCreateSchema.parse(req.body);
  res.status(202).json(await service.createPlan(body, actorOf(req), appConfig(req).DATABASE_URL));
});

plansRouter.get('/plans', async (req, res) => {
  res.json(await service.listPlanSummaries(planListQuerySchema.parse(req.query)));
});

plansRouter.get('/plans/:id', async (req, res) => {
  res.json(await service.getPlan(pathId(req, 'plan')));
});

const defaultsQuerySchema = z.strictObject({
  deliveryStart: z.iso
    .datetime({ offset: true, error: 'Give deliveryStart as an RFC 3339 time with offset.' })
    .transform((text) => new Date(text))
    .optional(),
});

plansRouter.get('/batteries/:id/plan-defaults', async (req, res) => {
  const { deliveryStart } = defaultsQuerySchema.parse(req.query);
  res.json(await service.planDefaults(pathId(req, 'battery'), deliveryStart ?? new Date()));
});
