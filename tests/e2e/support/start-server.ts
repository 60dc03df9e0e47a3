/**
 * Starts the app the way `npm start` does (built client, real PostgreSQL with the
 * demo scenario, fake SMTP) on a free port, for the browser journeys.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { clusterUrl } from '../../../scripts/lib/postgres';

const root = path.resolve(import.meta.dirname, '..', '..', '..');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

async function waitForHealth(url: string, child: ChildProcess, output: () => string) {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The app exited early:\n${output()}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The app did not become healthy in 60 s:\n${output()}`);
}

/**
 * Migrates and seeds the database the way `npm start` does (both idempotent). `npm test`
 * recreates it first; running the journeys alone still finds every migration applied.
 */
function prepareDatabase(databaseUrl: string): Promise<void> {
  return new Promise((resolve, reject) => {
    let output = '';
    const prepare = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['scripts/prepare-demo.ts'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: databaseUrl },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    prepare.stdout?.on('data', (d) => (output += String(d)));
    prepare.stderr?.on('data', (d) => (output += String(d)));
    prepare.on('error', reject);
    prepare.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`Preparing ${databaseUrl} failed:\n${output}`))));
  });
}

let child: ChildProcess | undefined;

export default async function setup(project: TestProject) {
  const port = await freePort();
  const baseUrl = `http://localhost:${port}`;
  const base = process.env.TEST_DATABASE_URL;
  const databaseUrl = base ? base.replace(/\/([^/?]+)(\?|$)/, '/$1_e2e$2') : clusterUrl('slackwater_e2e');
  await prepareDatabase(databaseUrl);
  let log = '';
  child = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      APP_ORIGIN: baseUrl,
      LOG_LEVEL: 'error',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d) => (log += String(d)));
  child.stderr?.on('data', (d) => (log += String(d)));
  await waitForHealth(baseUrl, child, () => log);
  project.provide('baseUrl', baseUrl);
  project.provide('databaseUrl', databaseUrl);
  return async () => {
    child?.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 300));
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
  }
}
