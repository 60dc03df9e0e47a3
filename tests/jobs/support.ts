/**
 * Fixtures for the plan, study and job API tests: a site, a battery and
 * profiles made through the real API, a job worker in this process on a
 * pg-boss schema of the test file's own (so test files running in parallel
 * never take each other's jobs), and polling helpers with generous timeouts.
 */
import { randomUUID } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import { expect } from 'vitest';
import type { Plan } from '@shared/schemas/plan';
import type { Study } from '@shared/schemas/study';
import { getPool } from '../../server/db/client';
import { startJobWorker, type JobWorker } from '../../server/jobs/job-worker';
import { stopBoss } from '../../server/jobs/boss';
import { loadJobsConfig } from '../../server/jobs/jobs-config';
import { testDatabaseUrl } from '../support/database-url';

export const HOUR_MS = 3_600_000;

/** Call at the top of a test file, before the app sends any job. */
export function useOwnJobQueues(name: string, extra: Record<string, string> = {}): void {
  // A forked test process may run several files: start from the defaults, not the last file's settings.
  for (const key of ['JOB_RETRY_LIMIT', 'JOB_STALE_SECONDS', 'WORKER_CONCURRENCY', 'STUDY_THREADS']) delete process.env[key];
  process.env.PGBOSS_SCHEMA = `pgboss_t_${name}`.slice(0, 50);
  Object.assign(process.env, extra);
}

export async function startTestWorker(): Promise<JobWorker> {
  return startJobWorker(testDatabaseUrl(), loadJobsConfig());
}

export async function stopTestWorker(worker: JobWorker | null): Promise<void> {
  await worker?.stop();
  await stopBoss(2000);
}

export interface SeriesSpec {
  /** Values per step: currency/MWh for prices, kW for load and generation. */
  values: readonly number[];
  startMs: number;
  stepMinutes: number;
}

export interface Place {
  siteId: string;
  batteryId: string;
  priceProfileId: string;
  loadProfileId: string | null;
}

function csv(spec: SeriesSpec): Buffer {
  const lines = ['time,value'];
  spec.values.forEach((v, i) => lines.push(`${new Date(spec.startMs + i * spec.stepMinutes * 60_000).toISOString()},${v}`));
  return Buffer.from(`${lines.join('\n')}\n`);
}

export async function uploadProfile(
  agent: TestAgent,
  siteId: string,
  kind: 'price' | 'load' | 'generation',
  spec: SeriesSpec,
): Promise<string> {
  const response = await agent
    .post(`/api/sites/${siteId}/profiles`)
    .field('kind', kind)
    .field('unit', kind === 'price' ? 'currency/MWh' : 'kW')
    .field('name', `Invented ${kind}`)
    .attach('file', csv(spec), `${kind}.csv`);
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body.id as string;
}

export interface PlaceSpec {
  prices: SeriesSpec;
  load?: SeriesSpec;
  site?: Record<string, unknown>;
  battery?: Record<string, unknown>;
}

/** A UTC site without limits, a battery (1 MW / 2 MWh unless overridden) and the profiles. */
export async function createPlace(agent: TestAgent, spec: PlaceSpec): Promise<Place> {
  const site = await agent.post('/api/sites').send({
    name: `Jobs site ${randomUUID().slice(0, 8)}`,
    timezone: 'UTC',
    importLimitKw: null,
    exportLimitKw: null,
    currency: 'EUR',
    ...spec.site,
  });
  expect(site.status, JSON.stringify(site.body)).toBe(201);
  const battery = await agent.post(`/api/sites/${site.body.id}/batteries`).send({
    name: 'Unit 1',
    energyKwh: 2000,
    powerChargeKw: 1000,
    powerDischargeKw: 1000,
    ...spec.battery,
  });
  expect(battery.status, JSON.stringify(battery.body)).toBe(201);
  const priceProfileId = await uploadProfile(agent, site.body.id, 'price', spec.prices);
  const loadProfileId = spec.load ? await uploadProfile(agent, site.body.id, 'load', spec.load) : null;
  return { siteId: site.body.id, batteryId: battery.body.id, priceProfileId, loadProfileId };
}

/** Polls `url` until the job behind it has finished (completed or failed). */
export async function waitUntilFinished<T extends Plan | Study>(agent: TestAgent, url: string, timeoutMs = 90_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await agent.get(url);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    const body = response.body as T;
    if (body.job && (body.job.state === 'completed' || body.job.state === 'failed')) return body;
    if (Date.now() > deadline) throw new Error(`The job behind ${url} did not finish: ${JSON.stringify(body.job)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export async function sqlRows<T extends Record<string, unknown>>(text: string, values: unknown[] = []): Promise<T[]> {
  return (await getPool().query<T>(text, values)).rows;
}

/** A daily price shape (invented): cheap night, dear evening, repeated for `days`. */
export function dailyPrices(days: number, stepMinutes = 60): number[] {
  const perDay = (24 * 60) / stepMinutes;
  return Array.from({ length: days * perDay }, (_, i) => {
    const hour = ((i % perDay) * stepMinutes) / 60;
    return Math.round((55 + 30 * Math.sin(((hour - 11) / 24) * 2 * Math.PI) + (hour >= 17 && hour < 20 ? 25 : 0)) * 100) / 100;
  });
}
