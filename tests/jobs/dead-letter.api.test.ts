/**
 * A job that runs out of attempts is not left "running" for ever: with no
 * retries allowed (JOB_RETRY_LIMIT=0), a plan whose worker process is killed
 * goes to pg-boss's dead-letter queue, and the dead-letter handler of another
 * worker ends the plan's job as failed with the reason on the plan page.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import { HOUR_MS, sqlRows } from '../support/api-fixtures';
import { createPlace, dailyPrices, useJobsTestFile, waitUntilFinished } from '../support/jobs';
import { WorkerProcesses } from './worker-processes';

const schema = 'pgboss_t_dead_letter';
const jobs = useJobsTestFile('dead_letter', { env: { JOB_RETRY_LIMIT: '0' }, worker: false });
const workers = new WorkerProcesses(schema, { JOB_RETRY_LIMIT: '0' });

beforeAll(async () => {
  await workers.clearQueues();
});
afterAll(async () => {
  workers.stopAll();
});

describe('a plan job out of attempts', () => {
  it('moves to the dead-letter queue and the plan fails with the reason, storing nothing', async () => {
    const start = Date.parse('2026-03-02T00:00:00Z');
    const place = await createPlace(jobs.planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    workers.hold();
    const first = await workers.start({ holding: true });
    const created = await jobs.planner.post('/api/plans').send({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: new Date(start).toISOString(),
      deliveryEnd: new Date(start + 24 * HOUR_MS).toISOString(),
      horizonHours: 24,
      terminalRule: 'free',
    });
    expect(created.status, JSON.stringify(created.body)).toBe(202);
    const { plan, job } = created.body as PlanCreated;
    await workers.killWhileRunning(first, job.id);
    workers.release();
    await workers.start({ holding: false });

    const failed = await waitUntilFinished<Plan>(jobs.planner, `/api/plans/${plan.id}`, 120_000);
    expect(failed.job!.state).toBe('failed');
    expect(failed.results).toBeNull();
    expect(failed.errorMessage).toMatch(
      /^The job was given up after 1 attempt\. Last error: The worker running this job stopped responding/,
    );
    const [bossJob] = await sqlRows<{ state: string }>(`select state::text from ${schema}.job where id = $1`, [job.id]);
    expect(bossJob!.state).toBe('failed');
    const dead = await sqlRows<{ n: number }>(
      `select count(*)::int as n from ${schema}.job where name = 'job-dead-letter' and data->>'jobId' = $1`,
      [job.id],
    );
    expect(dead[0]!.n).toBe(1);
  }, 240_000);
});
