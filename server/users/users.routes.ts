/** `GET|POST /api/users`, `PATCH /api/users/:id`, `POST /api/users/:id/invitations` (admin). HTTP only. */
import { Router, type Request } from 'express';
import { z } from 'zod';
import { inviteUserSchema, updateUserSchema } from '@shared/schemas/users';
import { notFound } from '../http/app-error';
import { appConfig, clientIp, requireUser } from '../auth/current-user';
import * as service from './users.service';

export const usersRouter = Router();

function adminFrom(req: Request): service.Admin {
  const user = requireUser(req);
  return { actorId: user.id, actorEmail: user.email, name: user.name, ip: clientIp(req) };
}

const idSchema = z.uuid();

function userId(req: Request): string {
  const parsed = idSchema.safeParse(req.params.id);
  if (!parsed.success) throw notFound('The user');
  return parsed.data;
}

usersRouter.get('/users', async (_req, res) => {
  res.json({ users: await service.listUsers() });
});

usersRouter.post('/users', async (req, res) => {
  const input = inviteUserSchema.parse(req.body);
  res.status(201).json(await service.inviteUser(input, adminFrom(req), appConfig(req).appOrigin));
});

usersRouter.patch('/users/:id', async (req, res) => {
  const id = userId(req);
  const patch = updateUserSchema.parse(req.body);
  res.json(await service.updateUser(id, patch, adminFrom(req)));
});

usersRouter.post('/users/:id/invitations', async (req, res) => {
  const id = userId(req);
  res.status(202).json(await service.resendInvitation(id, adminFrom(req), appConfig(req).appOrigin));
});
