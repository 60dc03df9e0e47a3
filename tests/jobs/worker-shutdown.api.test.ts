/**
 * Workers that stop, gracefully or not. A worker process stopped with SIGTERM
 * (a deploy, a service manager) hands its running job back without spending
 * one of the job's attempts; a worker killed without warning leaves a job
 * whose heartbeat goes late, and from then on its progress says the worker was
 * lost instead of promising the time left it last estimated. No timing: the
 * held worker keeps a claimed job waiting while a file exists
 * (tests/jobs/held-worker.ts), so it is surely running when it is stopped.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import type { Study, StudyCreated } from '@shared/schemas/study';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { createPlace, dailyPrices, stopTestWorker, useOwnJobQueues, waitUntilFinished } from '../support/jobs';
import { HOUR_MS, sqlRows } from '../support/api-fixtures';
import { pollUntil, WorkerProcesses } from './worker-processes';

const schema = 'pgboss_t_worker_shutdown';
// The web side reads heartbeats against the same stale window as the workers.
useOwnJobQueues('worker_shutdown', { JOB_STALE_SECONDS: '3' });
const app = createTestApp();
const workers = new WorkerProcesses(schema);
let planner: SignedInAgent;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  await workers.clearQueues();
});
afterAll(async () => {
  workers.stopAll();
  await stopTestWorker(null);
});

const start = Date.parse('2026-03-02T00:00:00Z');

async function bossJob(id: string) {
  const [row] = await sqlRows<{ state: string; retry_count: number }>(
    `select state::text, retry_count from ${schema}.job where id = $1`,
    [id],
  );
  return row;
}

describe('a worker process stopped with SIGTERM while it runs a horizon study', () => {
  it('hands the job back unspent: after three such restarts the study completes on its first counted attempt', async () => {
    const place = await createPlace(planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    workers.hold();
    const created = await planner.post('/api/studies').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      start: new Date(start).toISOString(),
      end: new Date(start + 48 * HOUR_MS).toISOString(),
      horizonsHours: [6, 12],
      replanHours: 1,
      terminalRules: ['free'],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const { study, job } = created.body as StudyCreated;

    // The default JOB_RETRY_LIMIT of 2 allows three attempts: three spent hand-backs would fail the study.
    for (let restart = 1; restart <= 3; restart++) {
      const worker = await workers.start({ holding: true });
      await workers.stopWhileRunning(worker, job.id);
      const waiting = (await planner.get(`/api/studies/${study.id}`)).body as Study;
      expect(waiting.job!.state, `after restart ${restart}`).toBe('queued');
      expect(waiting.job!.message).not.toMatch(/attempt failed/i);
      expect(waiting.job!.error).toBeNull();
      expect(waiting.errorMessage).toBeNull();
      expect(await bossJob(job.id)).toEqual({ state: 'created', retry_count: 0 });
    }

    workers.release();
    const last = await workers.start({ holding: false });
    const finished = await waitUntilFinished<Study>(planner, `/api/studies/${study.id}`, 120_000);
    await workers.stop(last);
    expect(finished.status, finished.errorMessage ?? '').toBe('completed');
    expect(finished.job!.attempt).toBe(1);
    expect(finished.results!.runs).toHaveLength(2);
    expect(await bossJob(job.id)).toEqual({ state: 'completed', retry_count: 0 });
    const stored = await sqlRows<{ n: number }>(
      "select count(*)::int as n from audit_events where entity_id = $1 and action = 'study.computed'",
      [study.id],
    );
    expect(stored[0]!.n).toBe(1);
  }, 300_000);
});

describe('a worker process killed without warning (kill -9) while it runs a plan', () => {
  it('shows "worker lost: waiting to resume" once the heartbeat is late, not its last estimate, and is resumed elsewhere', async () => {
    const place = await createPlace(planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    workers.hold();
    const first = await workers.start({ holding: true });
    const created = await planner.post('/api/plans').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: new Date(start).toISOString(),
      deliveryEnd: new Date(start + 24 * HOUR_MS).toISOString(),
      horizonHours: 24,
      terminalRule: 'free',
    });
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const { plan, job } = created.body as PlanCreated;
    await workers.waitUntilRunning(first, job.id);
    // The last progress the worker wrote before it died: 43 % done, 17 s left.
    await sqlRows('update job_progress set share_done = 0.43, eta_seconds = 17 where job_id = $1', [job.id]);
    const before = ((await planner.get(`/api/plans/${plan.id}`)).body as Plan).job!;
    expect(before).toMatchObject({ state: 'running', shareDone: 0.43, etaSeconds: 17 });

    await workers.killWhileRunning(first, job.id);
    const lost = await pollUntil('the plan to show its worker lost', async () => {
      const shown = ((await planner.get(`/api/plans/${plan.id}`)).body as Plan).job!;
      return shown.state === 'running' ? undefined : shown;
    });
    expect(lost.state).toBe('retrying');
    expect(lost.message).toMatch(/^worker lost: waiting to resume\.?$/i);
    expect(lost.etaSeconds).toBeNull();
    expect(lost.shareDone).toBe(0.43);
    // Nobody has taken the job over yet: the stored row still says running.
    const [row] = await sqlRows<{ state: string }>('select state from job_progress where job_id = $1', [job.id]);
    expect(row!.state).toBe('running');

    workers.release();
    await workers.start({ holding: false });
    const finished = await waitUntilFinished<Plan>(planner, `/api/plans/${plan.id}`, 120_000);
    expect(finished.job!.state, finished.errorMessage ?? '').toBe('completed');
    // A kill spends the attempt it interrupted.
    expect(finished.job!.attempt).toBe(2);
    expect(finished.results).not.toBeNull();
  }, 240_000);
});
