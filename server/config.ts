/** Environment, parsed once at start-up; a bad value stops the process naming the variable. */
import { z } from 'zod';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  DATABASE_URL: z.string().url({ message: 'must be a postgres:// URL' }),
  /** The origin browsers use to reach the app; state-changing requests from other origins are refused. */
  APP_ORIGIN: z.string().url().optional(),
  /** Run a background job worker inside the web server process. */
  RUN_WORKER: z.enum(['true', 'false']).default('true'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  MAIL_FROM: z.string().default('Slackwater <no-reply@slackwater.example>'),
  /** Start the local fake SMTP server (development, demo and tests). */
  FAKE_SMTP: z.enum(['true', 'false']).default('true'),
  LOG_LEVEL: z.enum(['silent', 'error', 'info', 'debug']).default('info'),
  /** Requests one API token may make per minute (server/tokens/token-auth.ts). */
  API_TOKEN_REQUESTS_PER_MINUTE: z.coerce.number().int().min(1).max(1_000_000).default(600),
  /** Requests with an invalid API token one client address may make per 15 minutes. */
  API_TOKEN_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).max(1_000_000).default(30),
});

export type AppConfig = z.infer<typeof envSchema> & { appOrigin: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const config = parsed.data;
  return { ...config, appOrigin: config.APP_ORIGIN ?? `http://localhost:${config.PORT}` };
}
