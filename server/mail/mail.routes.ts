/** `GET /api/mail/outbox`, `GET /api/mail/outbox/:id` (admin): what the fake SMTP server received. */
import { Router } from 'express';
import { z } from 'zod';
import { mailOutboxQuerySchema } from '@shared/schemas/mail';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import { findMail, listMail } from './mail.repo';

export const mailRouter = Router();

mailRouter.get('/mail/outbox', async (req, res) => {
  const query = mailOutboxQuerySchema.parse(req.query);
  const rows = await listMail(getDb(), query);
  res.json({ messages: rows.map((m) => ({ ...m, sentAt: m.sentAt.toISOString() })) });
});

const idSchema = z.coerce.number().int().positive().max(Number.MAX_SAFE_INTEGER);

mailRouter.get('/mail/outbox/:id', async (req, res) => {
  const id = idSchema.safeParse(req.params.id);
  const row = id.success ? await findMail(getDb(), id.data) : undefined;
  if (!row) throw notFound('The message');
  res.json({
    id: row.id,
    from: row.from,
    to: row.to,
    subject: row.subject,
    text: row.text,
    html: row.html,
    sentAt: row.sentAt.toISOString(),
  });
});
