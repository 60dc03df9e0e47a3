/**
 * What the fake SMTP server caught, read the way an administrator reads it: through the
 * admin's mail outbox API (`GET /api/mail/outbox`, `GET /api/mail/outbox/:id`), in a
 * request context of its own so no browser context's session is touched.
 */
import { expect, inject } from 'vitest';
import { request, type APIRequestContext } from 'playwright-core';
import { demoEmail, demoPassword } from './session';

interface MailSummary {
  id: number;
  to: string;
  subject: string;
}
export interface MailMessage extends MailSummary {
  text: string;
}

async function adminApi(): Promise<APIRequestContext> {
  const baseUrl = inject('baseUrl');
  const api = await request.newContext({ baseURL: baseUrl, extraHTTPHeaders: { Origin: baseUrl } });
  const signedIn = await api.post('/api/auth/sign-in', { data: { email: demoEmail('admin'), password: demoPassword } });
  if (!signedIn.ok()) throw new Error(`The admin could not sign in to read the outbox: ${signedIn.status()}`);
  return api;
}

/** The newest message id so far for `to` (0 if none): later messages are the ones a step under test sent. */
export async function lastMailId(to: string): Promise<number> {
  const api = await adminApi();
  try {
    const { messages } = (await (await api.get('/api/mail/outbox', { params: { to, limit: 1 } })).json()) as {
      messages: MailSummary[];
    };
    return messages[0]?.id ?? 0;
  } finally {
    await api.dispose();
  }
}

/** Waits (polling, up to `timeout` ms) for a message to `to` newer than `afterId` whose subject matches, and reads it. */
export async function waitForMail(to: string, subject: RegExp, afterId: number, timeout = 30_000): Promise<MailMessage> {
  const api = await adminApi();
  try {
    let found: MailSummary | undefined;
    await expect
      .poll(
        async () => {
          const response = await api.get('/api/mail/outbox', { params: { to, limit: 20 } });
          const { messages } = (await response.json()) as { messages: MailSummary[] };
          found = messages.find((m) => m.id > afterId && subject.test(m.subject));
          return found !== undefined;
        },
        { timeout, interval: 250, message: `an e-mail to ${to} with a subject like ${subject}` },
      )
      .toBe(true);
    const message = await api.get(`/api/mail/outbox/${found?.id}`);
    return (await message.json()) as MailMessage;
  } finally {
    await api.dispose();
  }
}
