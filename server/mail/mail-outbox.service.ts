/** Reading the mail outbox the fake SMTP server fills (development, demo and tests). */
import type { MailMessage, MailSummary } from '@shared/schemas/mail';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import { findMail, listMail } from './mail.repo';

export async function listOutbox(filter: { to?: string; limit: number }): Promise<MailSummary[]> {
  const rows = await listMail(getDb(), filter);
  return rows.map((m) => ({ ...m, sentAt: m.sentAt.toISOString() }));
}

export async function getOutboxMessage(id: number): Promise<MailMessage> {
  const row = await findMail(getDb(), id);
  if (!row) throw notFound('The message');
  return {
    id: row.id,
    from: row.from,
    to: row.to,
    subject: row.subject,
    text: row.text,
    html: row.html,
    sentAt: row.sentAt.toISOString(),
  };
}
