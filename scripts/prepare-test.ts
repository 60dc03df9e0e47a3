/**
 * Fresh test databases on every run, so demo data is never touched and no
 * test depends on what an earlier run left: one for API tests, one for the
 * browser journeys (loaded with the demo scenario).
 */
import pg from 'pg';
import { ensureCluster, clusterUrl, SetupError } from './lib/postgres';
import { ensureDatabase, migrateDatabase } from './lib/database';
import { ensureChromium } from './lib/chromium';
import { seedDemo } from './lib/seed-demo';

const log = (m: string) => console.log(m);

async function recreate(url: string) {
  const name = new URL(url).pathname.slice(1);
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    await client.query(`drop database if exists "${name}" with (force)`);
  } finally {
    await client.end();
  }
  await ensureDatabase(url);
  await migrateDatabase(url);
}

try {
  const base = process.env.TEST_DATABASE_URL;
  if (!base) await ensureCluster(log);
  const apiUrl = base ?? clusterUrl('slackwater_test');
  const e2eUrl = base ? base.replace(/\/([^/?]+)(\?|$)/, '/$1_e2e$2') : clusterUrl('slackwater_e2e');
  await recreate(apiUrl);
  await recreate(e2eUrl);
  await seedDemo(e2eUrl, () => undefined);
  if (process.env.SLACKWATER_TEST_ONLY !== 'unit') ensureChromium(log);
  log('Test databases ready.');
} catch (error) {
  console.error(error instanceof SetupError ? error.message : error);
  process.exit(1);
}
