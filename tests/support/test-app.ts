/** Boots the real Express app against the real test database for supertest. */
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initDb } from '../../server/db/client';
import { testDatabaseUrl } from './database-url';

export const testOrigin = 'http://localhost:3999';

export function createTestApp() {
  const url = testDatabaseUrl();
  initDb(url, 5);
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: url,
    APP_ORIGIN: testOrigin,
    RUN_WORKER: 'false',
    LOG_LEVEL: 'error',
  });
  return createApp(config);
}
