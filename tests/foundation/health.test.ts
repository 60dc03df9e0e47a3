import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createTestApp } from '../support/test-app';

describe('GET /api/health', () => {
  it('reports the database up when a query against PostgreSQL succeeds', async () => {
    const response = await request(createTestApp()).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ok: true, db: 'up' });
    expect(response.headers['cache-control']).toBe('no-store');
  });
});

describe('GET /api/health with the database down', () => {
  it('answers 503 with db "down" instead of pretending', async () => {
    // A separate process-level pool cannot be swapped here, so start a second app in a child
    // process pointed at a port where nothing listens.
    const { spawnSync } = await import('node:child_process');
    const script = `
      import request from 'supertest';
      import { createApp } from './server/app';
      import { loadConfig } from './server/config';
      import { initDb } from './server/db/client';
      const url = 'postgres://postgres@127.0.0.1:9/nowhere';
      initDb(url, 1);
      const app = createApp(loadConfig({ NODE_ENV: 'test', DATABASE_URL: url, LOG_LEVEL: 'silent' }));
      const r = await request(app).get('/api/health');
      console.log(JSON.stringify({ status: r.status, body: r.body }));
      process.exit(0);
    `;
    const result = spawnSync('node_modules/.bin/tsx', ['--input-type=module', '-e', script], { encoding: 'utf8' });
    const last = result.stdout.trim().split('\n').at(-1) ?? '';
    expect(JSON.parse(last)).toEqual({ status: 503, body: { ok: false, db: 'down' } });
  });

  it('never answers for the client bundle on an unknown API path', async () => {
    const app = createApp(loadConfig({ NODE_ENV: 'test', DATABASE_URL: 'postgres://x@127.0.0.1:9/x' }));
    const response = await request(app).get('/api/does-not-exist');
    expect(response.status).toBe(404);
    expect(response.body.error).toMatch(/No API route/);
  });
});
