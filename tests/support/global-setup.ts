/**
 * Makes sure the test database exists and is migrated (idempotent), so a
 * single test file can be run on its own; `npm test` recreates it fresh first.
 */
import { ensureCluster } from '../../scripts/lib/postgres';
import { ensureDatabase, migrateDatabase } from '../../scripts/lib/database';
import { testDatabaseUrl } from './database-url';

export default async function setup() {
  if (!process.env.TEST_DATABASE_URL) await ensureCluster(() => undefined);
  const url = testDatabaseUrl();
  await ensureDatabase(url);
  await migrateDatabase(url);
}
