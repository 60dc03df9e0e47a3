/** `GET /api/mail/outbox`, `GET /api/mail/outbox/:id` (admin): what the fake SMTP server received. HTTP only. */
import { Router } from 'express';
import { mailOutboxQuerySchema } from '@shared/schemas/mail';
import { pathId } from '../http/request-context';
import { getOutboxMessage, listOutbox } from './mail-outbox.service';

export const mailRouter = Router();

mailRouter.get('/mail/outbox', async (req, res) => {
  res.json({ messages: await listOutbox(mailOutboxQuerySchema.parse(req.query)) });
});

mailRouter.get('/mail/outbox/:id', async (req, res) => {
  res.json(await getOutboxMessage(pathId(req, 'message', { format: 'serial' })));
});
