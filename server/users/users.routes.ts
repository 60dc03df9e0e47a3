/** `GET|POST /api/users`, `PATCH /api/users/:id`, `POST /api/users/:id/invitations` (admin). HTTP only. */
import { Router } from 'express';
import { inviteUserSchema, updateUserSchema } from '@shared/schemas/users';
import { actorOf, pathId } from '../http/request-context';
import * as service from './users.service';

export const usersRouter = Router();

usersRouter.get('/users', async (_req, res) => {
  res.json({ users: await service.listUsers() });
});

usersRouter.post('/users', async (req, res) => {
  const input = inviteUserSchema.parse(req.body);
  res.status(201).json(await service.inviteUser(input, actorOf(req)));
});

usersRouter.patch('/users/:id', async (req, res) => {
  const id = pathId(req, 'user');
  const patch = updateUserSchema.parse(req.body);
  res.json(await service.updateUser(id, patch, actorOf(req)));
});

usersRouter.post('/users/:id/invitations', async (req, res) => {
  const id = pathId(req, 'user');
  res.status(202).json(await service.resendInvitation(id, actorOf(req)));
});
