/**
 * Fixtures for the plan, study and job API tests: the app with a signed-in
 * planner and a job worker in this process on a pg-boss schema of the test
 * file's own (so test files running in parallel never take each other's jobs),
 * a site with a battery and profiles made through the real API, and plans and
 * studies computed through the real job, polled with generous timeouts.
 */
import { afterAll, beforeAll, expect } from 'vitest';
import type { App } from 'supertest/types';
import type TestAgent from 'supertest/lib/agent';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import type { Study, StudyCreated } from '@shared/schemas/study';
import { startJobWorker, type JobWorker } from '../../server/jobs/job-worker';
import { stopBoss } from '../../server/jobs/boss';
import { loadJobsConfig } from '../../server/jobs/jobs-config';
import { createBattery, createSite, uniqueName, uploadSeries, type SeriesSpec } from './api-fixtures';
import { signInAs, type SignedInAgent } from './auth';
import { testDatabaseUrl } from './database-url';
import { createTestApp } from './test-app';

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

export interface JobsTestFile {
  readonly app: App;
  /** Signed in before the file's own `beforeAll` runs. */
  readonly planner: SignedInAgent;
  /** Starts the job worker of this process (once; later calls return it). */
  startWorker(): Promise<JobWorker>;
}

/**
 * Call at the top of a test file: its own job queues, the app, a planner signed
 * in before the tests and, unless `worker: false`, a job worker started with it;
 * whatever runs is stopped after the file.
 */
export function useJobsTestFile(name: string, options: { env?: Record<string, string>; worker?: boolean } = {}): JobsTestFile {
  useOwnJobQueues(name, options.env);
  const app = createTestApp();
  let planner: SignedInAgent | undefined;
  let worker: JobWorker | null = null;
  const startWorker = async () => (worker ??= await startTestWorker());
  beforeAll(async () => {
    planner = await signInAs(app, 'planner');
    if (options.worker !== false) await startWorker();
  });
  afterAll(async () => stopTestWorker(worker));
  return {
    app,
    get planner() {
      if (!planner) throw new Error('The planner signs in before the tests: use it inside a hook or a test.');
      return planner;
    },
    startWorker,
  };
}

export interface Place {
  siteId: string;
  batteryId: string;
  priceProfileId: string;
  loadProfileId: string | null;
}

export interface PlaceSpec {
  prices: SeriesSpec;
  load?: SeriesSpec;
  site?: Record<string, unknown>;
  battery?: Record<string, unknown>;
}

/** A UTC site without limits, a battery (1 MW / 2 MWh unless overridden) and the profiles. */
export async function createPlace(agent: TestAgent, spec: PlaceSpec): Promise<Place> {
  const site = await createSite(agent, {
    name: uniqueName('Jobs site'),
    timezone: 'UTC',
    importLimitKw: null,
    exportLimitKw: null,
    ...spec.site,
  });
  const batteryId = await createBattery(agent, site.id, spec.battery);
  const priceProfileId = await uploadSeries(agent, site.id, 'price', spec.prices);
  const loadProfileId = spec.load ? await uploadSeries(agent, site.id, 'load', spec.load) : null;
  return { siteId: site.id, batteryId, priceProfileId, loadProfileId };
}

/**
 * A battery the exact fast path takes (no daily cycle cap, which the lithium-ion
 * defaults have): 1 MW / 2 MWh, 0.95 / 0.92, SoC 10–90 % from 50 %, no losses or costs.
 */
export const exactPathBattery = (overrides: Record<string, unknown> = {}) => ({
  energyKwh: 2000,
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  efficiencyCharge: 0.95,
  efficiencyDischarge: 0.92,
  socMinPct: 10,
  socMaxPct: 90,
  socInitialPct: 50,
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
  ...overrides,
});

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

/** POST /api/plans (expecting 202) and the plan once its job has finished, completed or failed. */
export async function computePlan(agent: TestAgent, body: Record<string, unknown>): Promise<Plan> {
  const created = await agent.post('/api/plans').send(body);
  expect(created.status, JSON.stringify(created.body)).toBe(202);
  return waitUntilFinished<Plan>(agent, `/api/plans/${(created.body as PlanCreated).plan.id}`);
}

/** POST /api/studies (expecting 202) and the study once its job has finished, completed or failed. */
export async function computeStudy(agent: TestAgent, body: Record<string, unknown>): Promise<Study> {
  const created = await agent.post('/api/studies').send(body);
  expect(created.status, JSON.stringify(created.body)).toBe(202);
  return waitUntilFinished<Study>(agent, `/api/studies/${(created.body as StudyCreated).study.id}`);
}

/** A daily price shape (invented): cheap night, dear evening, repeated for `days`. */
export function dailyPrices(days: number, stepMinutes = 60): number[] {
  const perDay = (24 * 60) / stepMinutes;
  return Array.from({ length: days * perDay }, (_, i) => {
    const hour = ((i % perDay) * stepMinutes) / 60;
    return Math.round((55 + 30 * Math.sin(((hour - 11) / 24) * 2 * Math.PI) + (hour >= 17 && hour < 20 ? 25 : 0)) * 100) / 100;
  });
}
