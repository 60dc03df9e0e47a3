/**
 * Worker processes for the crash tests: `npm run worker` as child processes on
 * the test database and a pg-boss schema of the test file's own, plus a hold
 * file that keeps a started job waiting so a test can kill its worker at a
 * known point (tests/jobs/held-worker.ts), and polling with a generous timeout.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { testDatabaseUrl } from '../support/database-url';
import { sqlRows } from '../support/api-fixtures';

export class WorkerProcesses {
  private readonly children: ChildProcess[] = [];
  private readonly dir = mkdtempSync(path.join(tmpdir(), 'slackwater-hold-'));
  readonly holdFile = path.join(this.dir, 'hold');

  constructor(
    readonly schema: string,
    private readonly env: Record<string, string> = {},
  ) {}

  /** Drops what an earlier run of the test left in this pg-boss schema (its workers were killed on purpose). */
  async clearQueues(): Promise<void> {
    await sqlRows(`drop schema if exists ${this.schema} cascade`);
  }

  hold(): void {
    writeFileSync(this.holdFile, 'hold');
  }

  release(): void {
    rmSync(this.holdFile, { force: true });
  }

  /**
   * Starts a worker, resolved once it says it takes jobs. Node with tsx's loader rather than the
   * tsx command, so the child's pid is the worker's own (the tsx command runs it in a grandchild).
   */
  start(options: { holding: boolean }): Promise<ChildProcess> {
    const entry = options.holding ? 'tests/jobs/held-worker.ts' : 'server/worker.ts';
    const child = spawn(process.execPath, ['--import', 'tsx', entry], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        LOG_LEVEL: 'error',
        DATABASE_URL: testDatabaseUrl(),
        PGBOSS_SCHEMA: this.schema,
        JOB_STALE_SECONDS: '3',
        ...this.env,
        ...(options.holding ? { HOLD_FILE: this.holdFile } : {}),
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    this.children.push(child);
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

  /** Waits until `job` runs on `worker`. */
  async waitUntilRunning(worker: ChildProcess, jobId: string): Promise<void> {
    await pollUntil('the worker to run the job', async () => {
      const [row] = await sqlRows<{ state: string; worker: string | null }>(
        'select state, worker from job_progress where job_id = $1',
        [jobId],
      );
      return row?.state === 'running' && row.worker?.endsWith(`:${worker.pid}`) ? row : undefined;
    });
  }

  /** Waits until `job` runs on `worker`, then kills that process without warning. */
  async killWhileRunning(worker: ChildProcess, jobId: string): Promise<void> {
    await this.waitUntilRunning(worker, jobId);
    await this.signal(worker, 'SIGKILL');
  }

  /** Waits until `job` runs on `worker`, then stops that process the way a service manager does (SIGTERM). */
  async stopWhileRunning(worker: ChildProcess, jobId: string): Promise<void> {
    await this.waitUntilRunning(worker, jobId);
    await this.signal(worker, 'SIGTERM');
  }

  /** Stops a worker with SIGTERM and waits until it has exited. */
  async stop(worker: ChildProcess): Promise<void> {
    if (worker.exitCode === null && worker.signalCode === null) await this.signal(worker, 'SIGTERM');
  }

  private async signal(worker: ChildProcess, signal: NodeJS.Signals): Promise<void> {
    const exited = new Promise((resolve) => worker.once('exit', resolve));
    worker.kill(signal);
    await exited;
  }

  stopAll(): void {
    for (const child of this.children) if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
    rmSync(this.dir, { recursive: true, force: true });
  }
}

export async function pollUntil<T>(what: string, read: () => Promise<T | undefined>, timeoutMs = 60_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
