/**
 * Settings of the job system, read from the environment once and checked with
 * zod: a bad value stops the process naming the variable.
 */
import { z } from 'zod';

const envSchema = z.object({
  /** Jobs one process works on at once (each solve runs in its own worker thread). */
  WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(32).default(1),
  /** A running job whose heartbeat is older than this is handed to another worker. */
  JOB_STALE_SECONDS: z.coerce.number().min(2).max(3600).default(60),
  /** Retries after the first attempt before a job goes to the dead-letter queue. */
  JOB_RETRY_LIMIT: z.coerce.number().int().min(0).max(10).default(2),
  /** Hard ceiling of one attempt (pg-boss expiry); heartbeats catch dead workers much sooner. */
  JOB_EXPIRE_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .max(23 * 60)
    .default(180),
  /** PostgreSQL schema of pg-boss's tables; every process of one installation must use the same. */
  PGBOSS_SCHEMA: z
    .string()
    .regex(/^[a-z_][a-z0-9_]{0,49}$/, 'use lower-case letters, digits and underscores')
    .default('pgboss'),
});

export type JobsConfig = z.infer<typeof envSchema> & {
  heartbeatMs: number;
  /**
   * Runs after a job has been claimed and its heartbeat started, before the handler.
   * Only tests set it (to stop a job at a known point); it is never read from the environment.
   */
  beforeHandler?: (signal: AbortSignal) => Promise<void>;
};

export function loadJobsConfig(env: NodeJS.ProcessEnv = process.env): JobsConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid job settings in the environment:\n${lines.join('\n')}`);
  }
  // Four heartbeats fit in the stale window, so one slow database round trip is not fatal.
  const heartbeatMs = Math.max(500, (parsed.data.JOB_STALE_SECONDS * 1000) / 4);
  return { ...parsed.data, heartbeatMs };
}

let once: JobsConfig | null = null;

/** The settings as this process read them first (for readers that run per request, such as the progress a page polls). */
export function jobsConfig(): JobsConfig {
  once ??= loadJobsConfig();
  return once;
}
