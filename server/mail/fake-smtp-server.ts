/**
 * A local SMTP server for development, demo and tests: listens on loopback only and
 * stores every message it receives in `mail_outbox`, where admins read it on the mail
 * outbox page. The message is stored before the SMTP transaction is acknowledged, so
 * once `sendMail` resolves the row exists.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { insertMail } from './mail.repo';

export interface FakeSmtp {
  readonly port: number;
  close(): Promise<void>;
}

export async function startFakeSmtp(port = 0): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = session.envelope.rcptTo.map((a) => a.address).join(', ');
          const from = parsed.from?.text || (session.envelope.mailFrom ? session.envelope.mailFrom.address : '');
          await insertMail(getDb(), {
            messageId: parsed.messageId ?? null,
            from,
            to,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          });
          callback();
        })
        .catch((error: unknown) => {
          logger.error('The fake SMTP server could not store a message', error);
          callback(new Error('The message could not be stored.'));
        });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  server.on('error', (error) => logger.error('Fake SMTP server error', error));
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
