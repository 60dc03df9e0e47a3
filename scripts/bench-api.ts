/**
 * API benchmark: plans and studies through the jobs (figures, not a test). Prints JSON.
 *   1. API p95 latency of GET /api/plans/:id while a year-long horizon study runs
 *      in the same process's default worker (the web server runs one by default),
 *      against the same requests with nothing running;
 *   2. a month of 15-minute data studied over 6 horizons with the default worker:
 *      seconds from POST /api/studies to the stored result;
 *   3. the horizon preview of a one-day plan (a year of hourly prices behind it) at
 *      H = 24 h and H = 168 h: p50/p95 per request (scripts/lib/bench-preview.ts).
 * Each study runs twice: for a battery the exact dynamic program takes (no daily
 * cycle cap: the fast path) and for the lithium-ion defaults (a cap of one cycle
 * per day couples each day's steps: the LP path).
 * Uses its own database (slackwater_bench, recreated), the real app on a free
 * port, real HTTP with a signed-in planner, invented prices.
 * Run: npx tsx scripts/bench-api.ts   (BENCH_SKIP_LP_YEAR=1 skips the slow LP-path year study,
 *   BENCH_PREVIEW_ONLY=1 measures only the horizon preview)
 */
import { randomUUID } from 'node:crypto';
import { loadavg, cpus } from 'node:os';
import net, { type AddressInfo } from 'node:net';
import pg from 'pg';
import { clusterUrl, ensureCluster } from './lib/postgres';
import { ensureDatabase, migrateDatabase } from './lib/database';
import { createApp } from '../server/app';
import { loadConfig } from '../server/config';
import { closeDb, getDb, initDb } from '../server/db/client';
import { users } from '../server/users/users.schema';
import { hashPassword } from '../server/auth/password-hash';
import { startJobWorker } from '../server/jobs/job-worker';
import { stopBoss } from '../server/jobs/boss';
import { logger } from '../server/logger';
import { measurePreview } from './lib/bench-preview';

const HOUR_MS = 3_600_000;
const START = Date.parse('2026-01-01T00:00:00Z');
logger.setLevel('error');

/** Invented prices: daily and weekly shape, seasons, some noise and a few negative hours. */
function prices(count: number, stepMinutes: number): number[] {
  let seed = 7;
  const noise = () => ((seed = (seed * 16807) % 2147483647) / 2147483647 - 0.5) * 12;
  return Array.from({ length: count }, (_, i) => {
    const hours = (i * stepMinutes) / 60;
    const hour = hours % 24;
    const day = Math.floor(hours / 24);
    const daily = 25 * Math.sin(((hour - 10) / 24) * 2 * Math.PI) + (hour >= 17 && hour < 20 ? 30 : 0);
    const season = 15 * Math.cos((day / 365) * 2 * Math.PI);
    const weekend = day % 7 >= 5 ? -10 : 0;
    const value = 60 + daily + season + weekend + noise() - (hour >= 12 && hour < 14 && day % 9 === 0 ? 80 : 0);
    return Math.round(value * 100) / 100;
  });
}

function csv(values: number[], stepMinutes: number): string {
  return (
    ['time,price', ...values.map((v, i) => `${new Date(START + i * stepMinutes * 60_000).toISOString()},${v}`)].join('\n') + '\n'
  );
}

class Client {
  private cookie = '';
  constructor(readonly base: string) {}
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of our own API; each call site knows its shape
  async call(method: string, path: string, body?: unknown, form?: FormData): Promise<{ status: number; body: any }> {
    const headers: Record<string, string> = { Origin: this.base, Cookie: this.cookie };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    const res = await fetch(`${this.base}${path}`, {
      method,
      headers,
      body: form ?? (body === undefined ? undefined : JSON.stringify(body)),
    });
    const setCookie = res.headers.getSetCookie();
    if (setCookie.length) this.cookie = setCookie.map((c) => c.split(';')[0]).join('; ');
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : null };
  }
  async ok(method: string, path: string, body?: unknown, form?: FormData) {
    const r = await this.call(method, path, body, form);
    if (r.status >= 300) throw new Error(`${method} ${path} → ${r.status}: ${JSON.stringify(r.body)}`);
    return r.body;
  }
}

function percentiles(samples: number[]) {
  const s = [...samples].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))] ?? NaN;
  const r = (v: number) => Math.round(v * 10) / 10;
  return { requests: s.length, p50Ms: r(at(0.5)), p95Ms: r(at(0.95)), p99Ms: r(at(0.99)), maxMs: r(s.at(-1) ?? NaN) };
}

/** Sequential GETs (two in flight, like two browser tabs polling) until `done()`. */
async function hammer(client: Client, path: string, done: () => boolean, minRequests = 0): Promise<number[]> {
  const samples: number[] = [];
  const loop = async () => {
    while (!done() || samples.length < minRequests) {
      const t = performance.now();
      const r = await client.call('GET', path);
      if (r.status !== 200) throw new Error(`GET ${path} → ${r.status}`);
      samples.push(performance.now() - t);
    }
  };
  await Promise.all([loop(), loop()]);
  return samples;
}

/** POSTs a study and polls it to the end; with `measure`, hammers GET planPath meanwhile. */
async function studyUntilDone(client: Client, body: unknown, measure = false) {
  const t0 = performance.now();
  let study = (await client.ok('POST', '/api/studies', body)).study;
  let finished = false;
  const poll = async () => {
    while (!['completed', 'failed'].includes(study.status)) {
      await new Promise((r) => setTimeout(r, 250));
      study = await client.ok('GET', `/api/studies/${study.id}`);
    }
    finished = true;
  };
  const [, samples] = await Promise.all([poll(), measure ? hammer(client, planPath, () => finished) : Promise.resolve([])]);
  if (study.status !== 'completed') throw new Error(`study failed: ${study.errorMessage}`);
  return {
    wallSeconds: (performance.now() - t0) / 1000,
    engineSeconds: study.results.seconds as number,
    method: study.method as string,
    runs: study.results.runs.length as number,
    samples,
  };
}

let planPath = '';

async function main() {
  await ensureCluster(() => undefined);
  const url = clusterUrl('slackwater_bench');
  const admin = new pg.Client({ connectionString: clusterUrl('postgres') });
  await admin.connect();
  await admin.query('drop database if exists slackwater_bench with (force)');
  await admin.end();
  await ensureDatabase(url);
  await migrateDatabase(url);
  initDb(url, 10);
  const password = 'bench-password-tide-47';
  const email = `planner-${randomUUID().slice(0, 8)}@bench.slackwater.example`;
  await getDb()
    .insert(users)
    .values({ id: randomUUID(), email, name: 'Bench planner', role: 'planner', passwordHash: await hashPassword(password) });

  // The origin check compares with APP_ORIGIN, so find a free port first.
  const probe = net.createServer().listen(0, '127.0.0.1');
  await new Promise((r) => probe.once('listening', r));
  const port = (probe.address() as AddressInfo).port;
  await new Promise((r) => probe.close(r));
  const base = `http://127.0.0.1:${port}`;
  const app = createApp(
    loadConfig({ NODE_ENV: 'production', DATABASE_URL: url, LOG_LEVEL: 'error', FAKE_SMTP: 'false', APP_ORIGIN: base }),
  );
  const server = app.listen(port, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const client = new Client(base);
  await client.ok('POST', '/api/auth/sign-in', { email, password });

  const site = await client.ok('POST', '/api/sites', {
    name: `Bench ${randomUUID().slice(0, 6)}`,
    timezone: 'UTC',
    importLimitKw: null,
    exportLimitKw: null,
    currency: 'EUR',
  });
  // Lithium-ion defaults include a daily cycle cap, which couples the steps of a day: the engine takes the LP path.
  const battery = await client.ok('POST', `/api/sites/${site.id}/batteries`, {
    name: 'Unit LP',
    energyKwh: 2000,
    powerChargeKw: 1000,
    powerDischargeKw: 1000,
  });
  // Without the cap every window is exact for the dynamic program: the fast path.
  const dpBattery = await client.ok('POST', `/api/sites/${site.id}/batteries`, {
    name: 'Unit DP',
    energyKwh: 2000,
    powerChargeKw: 1000,
    powerDischargeKw: 1000,
    maxCyclesPerDay: null,
  });
  const upload = async (values: number[], step: number, name: string) => {
    const form = new FormData();
    form.set('kind', 'price');
    form.set('unit', 'currency/MWh');
    form.set('name', name);
    form.set('file', new Blob([csv(values, step)], { type: 'text/csv' }), `${name}.csv`);
    return (await client.ok('POST', `/api/sites/${site.id}/profiles`, undefined, form)).id as string;
  };
  const year = await upload(prices(8760, 60), 60, 'year-hourly');
  const month = await upload(prices(31 * 96, 15), 15, 'month-15min');

  const worker = await startJobWorker(url);
  const plan = await client.ok('POST', '/api/plans', {
    batteryId: battery.id,
    priceProfileId: year,
    deliveryStart: new Date(START + 24 * HOUR_MS).toISOString(),
    deliveryEnd: new Date(START + 48 * HOUR_MS).toISOString(),
    horizonHours: 48,
    terminalRule: 'steady-value',
  });
  planPath = `/api/plans/${plan.plan.id}`;
  while ((await client.ok('GET', planPath)).job.state !== 'completed') await new Promise((r) => setTimeout(r, 200));

  // The preview re-plans a one-day plan of the fast-path battery with other horizons, on the web process's preview
  // thread (the first preview also starts that thread, which loads the engine: under tsx most of its time).
  const dpPlan = await client.ok('POST', '/api/plans', {
    batteryId: dpBattery.id,
    priceProfileId: year,
    deliveryStart: new Date(START + 24 * HOUR_MS).toISOString(),
    deliveryEnd: new Date(START + 48 * HOUR_MS).toISOString(),
    horizonHours: 24,
    terminalRule: 'steady-value',
  });
  while ((await client.ok('GET', `/api/plans/${dpPlan.plan.id}`)).job.state !== 'completed')
    await new Promise((r) => setTimeout(r, 200));
  const horizonPreview = await measurePreview(client, dpPlan.plan.id, [24, 168]);
  if (process.env.BENCH_PREVIEW_ONLY === '1') {
    console.log(JSON.stringify({ machine: machineInfo(), horizonPreview }, null, 2));
    await worker.stop();
    await stopBoss(2000);
    server.close();
    await closeDb();
    return;
  }

  // Let the worker's solve threads finish loading the engine before measuring "idle".
  await new Promise((r) => setTimeout(r, 5000));
  const idle = percentiles(await hammer(client, planPath, () => true, 400));
  const horizons = [6, 12, 24, 48, 96, 168];
  const terminalRules = ['free', 'steady-value'];
  const period = (days: number) => ({
    start: new Date(START).toISOString(),
    end: new Date(START + days * 24 * HOUR_MS).toISOString(),
  });
  const study = async (batteryId: string, profileId: string, days: number, measure: boolean) => {
    const r = await studyUntilDone(
      client,
      { batteryId, priceProfileId: profileId, ...period(days), horizonsHours: horizons, replanHours: 1, terminalRules },
      measure,
    );
    return {
      wallSeconds: round(r.wallSeconds),
      engineSeconds: round(r.engineSeconds),
      method: r.method,
      runs: r.runs,
      ...(measure ? { getPlanLatencyWhileRunning: percentiles(r.samples) } : {}),
    };
  };
  const results = {
    yearStudyDp: await study(dpBattery.id, year, 365, true),
    yearStudyLp: process.env.BENCH_SKIP_LP_YEAR === '1' ? null : await study(battery.id, year, 365, true),
    monthOf15MinuteStudyDp: await study(dpBattery.id, month, 31, false),
    monthOf15MinuteStudyLp: await study(battery.id, month, 31, false),
  };
  console.log(
    JSON.stringify(
      {
        machine: machineInfo(),
        study: { horizons, terminalRules, replanHours: 1 },
        getPlanLatencyIdle: idle,
        horizonPreview,
        ...results,
      },
      null,
      2,
    ),
  );
  await worker.stop();
  await stopBoss(2000);
  server.close();
  await closeDb();
}

const round = (v: number) => Math.round(v * 100) / 100;
const machineInfo = () => ({ cores: cpus().length, loadAverage1m: Math.round(loadavg()[0]! * 10) / 10, node: process.version });

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
