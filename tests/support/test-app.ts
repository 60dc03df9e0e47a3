/** Boots the real Express app against the real test database for supertest. */
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initDb } from '../../server/db/client';
import { testDatabaseUrl } from './database-url';

export const testOrigin = 'http://localhost:3999';

/** `env` adds or overrides environment variables, e.g. a low rate limit for one test file. */
export function createTestApp(env: Record<string, string> = {}) {
  const url = testDatabaseUrl();
  initDb(url, 5);
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: url,
    APP_ORIGIN: testOrigin,
    RUN_WORKER: 'false',
    LOG_LEVEL: 'error',
    ...env,
  });
  return createApp(config);
}
