/**
 * `GET|POST /api/tokens`, `DELETE /api/tokens/:id` (one's own tokens), and the admin's
 * `GET|POST /api/service-users`, `POST /api/service-users/:id/tokens`. HTTP only.
 */
import { Router } from 'express';
import { serviceUserCreateSchema, tokenCreateSchema } from '@shared/schemas/tokens';
import { requireUser } from '../auth/current-user';
import { actorOf, pathId } from '../http/request-context';
import * as tokens from './tokens.service';
import * as serviceUsers from './service-users.service';

export const tokensRouter = Router();

tokensRouter.get('/tokens', async (req, res) => {
  res.json(await tokens.listTokens(requireUser(req).id));
});

/** The answer holds the secret: the only time it is ever shown. */
tokensRouter.post('/tokens', async (req, res) => {
  const input = tokenCreateSchema.parse(req.body);
  const created = await tokens.createToken(requireUser(req).id, input, actorOf(req));
  res.status(201).json(created);
});

tokensRouter.delete('/tokens/:id', async (req, res) => {
  await tokens.revokeToken(pathId(req, 'API token'), requireUser(req), actorOf(req));
  res.status(204).end();
});

tokensRouter.get('/service-users', async (_req, res) => {
  res.json(await serviceUsers.listServiceUsers());
});

tokensRouter.post('/service-users', async (req, res) => {
  const input = serviceUserCreateSchema.parse(req.body);
  res.status(201).json(await serviceUsers.createServiceUser(input, actorOf(req)));
});

tokensRouter.post('/service-users/:id/tokens', async (req, res) => {
  const id = pathId(req, 'service user');
  const input = tokenCreateSchema.parse(req.body);
  res.status(201).json(await serviceUsers.createServiceUserToken(id, input, actorOf(req)));
});
