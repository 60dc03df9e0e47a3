/**
 * SECURITY.md "Tests that make the bar real" 4: a worker process killed in the
 * middle of a horizon study. Another worker process notices the missing
 * heartbeat, pg-boss retries the job there, it completes once, and the
 * results are stored once. No timing: the first worker holds the job (while
 * a file exists) so it is surely running when it is killed; everything else
 * is polling with generous timeouts.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Study, StudyCreated } from '@shared/schemas/study';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { testDatabaseUrl } from '../support/database-url';
import { createPlace, dailyPrices, HOUR_MS, sqlRows, stopTestWorker, useOwnJobQueues, waitUntilFinished } from './support';

const schema = 'pgboss_t_worker_killed';
useOwnJobQueues('worker_killed');
const app = createTestApp();
const dir = mkdtempSync(path.join(tmpdir(), 'slackwater-hold-'));
const holdFile = path.join(dir, 'hold');
const children: ChildProcess[] = [];
let planner: SignedInAgent;

/**
 * `npm run worker` as a child process, resolved once it says it takes jobs. Node with tsx's
 * loader rather than the tsx command, so the child's pid is the worker's own (the tsx command
 * would run the worker in a grandchild).
 */
function startWorkerProcess(env: Record<string, string>): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker.ts'], {
    env: { ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'error', DATABASE_URL: testDatabaseUrl(), PGBOSS_SCHEMA: schema, JOB_STALE_SECONDS: '3', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  return new Promise((resolve, reject) => {
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes(`worker ready pid=${child.pid}`)) resolve(child);
    });
    child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.on('exit', (code) => reject(new Error(`the worker process exited (${code}) before it was ready:\n${output}`)));
  });
}

async function pollUntil<T>(what: string, read: () => Promise<T | undefined>, timeoutMs = 60_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  // Jobs left by an earlier run of this file (its workers were killed on purpose) would be taken first.
  await sqlRows(`drop schema if exists ${schema} cascade`);
});
afterAll(async () => {
  for (const child of children) if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
  await stopTestWorker(null);
});

describe('a worker process killed in the middle of a horizon study', () => {
  it('has its job retried by another worker process, completed once, with results stored once', async () => {
    const start = Date.parse('2026-03-02T00:00:00Z');
    const place = await createPlace(planner, { prices: { values: dailyPrices(3), startMs: start, stepMinutes: 60 } });
    writeFileSync(holdFile, 'hold');
    const first = await startWorkerProcess({ SLACKWATER_JOB_HOLD_FILE: holdFile });

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

    // The first worker has claimed the job and is in the middle of it.
    await pollUntil('the first worker to run the job', async () => {
      const [row] = await sqlRows<{ state: string; worker: string | null }>('select state, worker from job_progress where job_id = $1', [job.id]);
      return row?.state === 'running' && row.worker?.endsWith(`:${first.pid}`) ? row : undefined;
    });
    const exited = new Promise((resolve) => first.once('exit', resolve));
    first.kill('SIGKILL');
    await exited;

    // Killed mid-job: nothing half-written.
    const [halfway] = await sqlRows<{ results: unknown }>('select results from horizon_studies where id = $1', [study.id]);
    expect(halfway!.results).toBeNull();

    rmSync(holdFile);
    expect(existsSync(holdFile)).toBe(false);
    const second = await startWorkerProcess({});
    const finished = await waitUntilFinished<Study>(planner, `/api/studies/${study.id}`, 120_000);

    expect(finished.status, finished.errorMessage ?? '').toBe('completed');
    expect(finished.job!.attempt).toBe(2);
    expect(finished.results!.runs).toHaveLength(2);
    const [progress] = await sqlRows<{ worker: string }>('select worker from job_progress where job_id = $1', [job.id]);
    expect(progress!.worker).toMatch(new RegExp(`:${second.pid}$`));
    const stored = await sqlRows<{ n: number }>("select count(*)::int as n from audit_events where entity_id = $1 and action = 'study.computed'", [study.id]);
    expect(stored[0]!.n).toBe(1);
    // pg-boss's own record: the same job, completed, after one retry.
    const [bossJob] = await sqlRows<{ state: string; retry_count: number }>(`select state::text, retry_count from ${schema}.job where id = $1`, [job.id]);
    expect(bossJob).toEqual({ state: 'completed', retry_count: 1 });
  }, 240_000);
});
