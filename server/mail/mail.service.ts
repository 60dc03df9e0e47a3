/**
 * Outgoing e-mail through nodemailer over SMTP. Production sets SMTP_* and MAIL_FROM;
 * with FAKE_SMTP=true (development, demo, tests) messages go to the local fake server,
 * started with the app or, in a process that did not start it (tests, job workers),
 * on first use.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import { loadConfig, type AppConfig } from '../config';
import { AppError } from '../http/app-error';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp-server';

export interface MailInput {
  to: string;
  subject: string;
  /** Plain text is always sent; it is what the fake outbox and most tests read. */
  text: string;
  html?: string;
}

type MailSettings = Pick<
  AppConfig,
  'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_USER' | 'SMTP_PASSWORD' | 'SMTP_SECURE' | 'MAIL_FROM' | 'FAKE_SMTP'
>;

let settings: MailSettings | null = null;
let fake: Promise<FakeSmtp> | null = null;
let transporter: Promise<Transporter> | null = null;

/** Called by createApp (and worker entry points) with the parsed environment. */
export function configureMail(config: MailSettings) {
  settings = config;
  transporter = null;
}

/** Starts the local fake SMTP server once per process (FAKE_SMTP=true). */
export function ensureFakeSmtp(port = 0): Promise<FakeSmtp> {
  fake ??= startFakeSmtp(port);
  return fake;
}

export async function stopFakeSmtp() {
  const running = fake;
  fake = null;
  transporter = null;
  if (running) await (await running).close();
}

async function buildTransport(s: MailSettings): Promise<Transporter> {
  if (s.FAKE_SMTP === 'true') {
    const { port } = await ensureFakeSmtp(s.SMTP_PORT);
    return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }
  if (!s.SMTP_PORT) {
    throw new AppError('mail_not_configured', 'E-mail is not configured: set SMTP_HOST and SMTP_PORT, or FAKE_SMTP=true.', 503);
  }
  return nodemailer.createTransport({
    host: s.SMTP_HOST,
    port: s.SMTP_PORT,
    secure: s.SMTP_SECURE === 'true',
    ...(s.SMTP_USER ? { auth: { user: s.SMTP_USER, pass: s.SMTP_PASSWORD ?? '' } } : {}),
  });
}

const oneLine = (s: string) => s.replace(/[\r\n\t\u2028\u2029]+/g, ' ').trim();

/**
 * Sends one message and resolves when the SMTP server accepted it (with the fake
 * server: once it is in the mail outbox). Throws when delivery fails; callers decide
 * whether that fails the request.
 */
export async function sendMail(mail: MailInput): Promise<void> {
  // A process that never called configureMail (a job worker, a script) reads the environment itself.
  const s = (settings ??= loadConfig());
  transporter ??= buildTransport(s);
  const transport = await transporter.catch((error: unknown) => {
    transporter = null;
    throw error;
  });
  await transport.sendMail({
    from: s.MAIL_FROM,
    to: mail.to,
    subject: oneLine(mail.subject),
    text: mail.text,
    ...(mail.html ? { html: mail.html } : {}),
  });
}
