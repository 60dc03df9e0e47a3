/**
 * SECURITY.md "Tests that make the bar real" 4: a worker process killed in the
 * middle of a horizon study. Another worker process notices the missing
 * heartbeat, pg-boss retries the job there, it completes once, and the
 * results are stored once. No timing: the first worker holds the job (while
 * a file exists) so it is surely running when it is killed; everything else
 * is polling with generous timeouts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Study, StudyCreated } from '@shared/schemas/study';
import { HOUR_MS, sqlRows } from '../support/api-fixtures';
import { createPlace, dailyPrices, useJobsTestFile, waitUntilFinished } from '../support/jobs';
import { WorkerProcesses } from './worker-processes';

const schema = 'pgboss_t_worker_killed';
const jobs = useJobsTestFile('worker_killed', { worker: false });
const workers = new WorkerProcesses(schema);

beforeAll(async () => {
  await workers.clearQueues();
});
afterAll(async () => {
  workers.stopAll();
});

describe('a worker process killed in the middle of a horizon study', () => {
  it('has its job retried by another worker process, completed once, with results stored once', async () => {
    const start = Date.parse('2026-03-02T00:00:00Z');
    const place = await createPlace(jobs.planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    workers.hold();
    const first = await workers.start({ holding: true });

    const created = await jobs.planner.post('/api/studies').send({
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
    await workers.killWhileRunning(first, job.id);

    // Killed mid-job: nothing half-written.
    const [halfway] = await sqlRows<{ results: unknown }>('select results from horizon_studies where id = $1', [study.id]);
    expect(halfway!.results).toBeNull();

    workers.release();
    const second = await workers.start({ holding: false });
    const finished = await waitUntilFinished<Study>(jobs.planner, `/api/studies/${study.id}`, 120_000);

    expect(finished.status, finished.errorMessage ?? '').toBe('completed');
    expect(finished.job!.attempt).toBe(2);
    expect(finished.results!.runs).toHaveLength(2);
    const [progress] = await sqlRows<{ worker: string }>('select worker from job_progress where job_id = $1', [job.id]);
    expect(progress!.worker).toMatch(new RegExp(`:${second.pid}$`));
    const stored = await sqlRows<{ n: number }>(
      "select count(*)::int as n from audit_events where entity_id = $1 and action = 'study.computed'",
      [study.id],
    );
    expect(stored[0]!.n).toBe(1);
    // pg-boss's own record: the same job, completed, after one retry.
    const [bossJob] = await sqlRows<{ state: string; retry_count: number }>(
      `select state::text, retry_count from ${schema}.job where id = $1`,
      [job.id],
    );
    expect(bossJob).toEqual({ state: 'completed', retry_count: 1 });
  }, 240_000);
});
