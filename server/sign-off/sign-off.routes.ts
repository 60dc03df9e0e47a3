/**
 * `POST /api/plans/:id/submit|approve|reject {comment?, version}`,
 * `POST /api/plans/:id/copy`, `GET /api/plans/:id/sign-off`,
 * `GET /api/sign-off/pending`. HTTP only: the rules live in the service, the
 * roles in server/auth/access-table.ts.
 */
import { Router } from 'express';
import { copyActionSchema, rejectActionSchema, signOffActionSchema } from '@shared/schemas/sign-off';
import { requireUser } from '../auth/current-user';
import { actorOf } from '../http/request-context';
import { planPathId } from './plan-path-id';
import { pendingSignOffs, signOffRecord } from './sign-off-record';
import { approvePlan, copyPlan, rejectPlan, submitPlan } from './sign-off.service';

export const signOffRouter = Router();

signOffRouter.post('/plans/:id/submit', async (req, res) => {
  const id = planPathId(req);
  const body = signOffActionSchema.parse(req.body ?? {});
  await submitPlan(actorOf(req), id, body);
  res.json(await signOffRecord(id, requireUser(req)));
});

signOffRouter.post('/plans/:id/approve', async (req, res) => {
  const id = planPathId(req);
  const body = signOffActionSchema.parse(req.body ?? {});
  const { supersededPlanIds } = await approvePlan(actorOf(req), id, body);
  res.json({ ...(await signOffRecord(id, requireUser(req))), supersededPlanIds });
});

signOffRouter.post('/plans/:id/reject', async (req, res) => {
  const id = planPathId(req);
  const body = rejectActionSchema.parse(req.body ?? {});
  await rejectPlan(actorOf(req), id, body);
  res.json(await signOffRecord(id, requireUser(req)));
});

signOffRouter.post('/plans/:id/copy', async (req, res) => {
  const id = planPathId(req);
  copyActionSchema.parse(req.body ?? {});
  const copy = await copyPlan(actorOf(req), id);
  res
    .status(201)
    .location(`/api/plans/${copy.id}`)
    .json({ id: copy.id, status: copy.status, version: copy.version, copiedFrom: copy.copiedFrom });
});

signOffRouter.get('/plans/:id/sign-off', async (req, res) => {
  const id = planPathId(req);
  res.json(await signOffRecord(id, requireUser(req)));
});

signOffRouter.get('/sign-off/pending', async (req, res) => {
  res.json({ plans: await pendingSignOffs(requireUser(req)) });
});
