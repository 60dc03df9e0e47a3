/** Database creation and migration, shared by the start, test and db scripts. */
import pg from 'pg';
import path from 'node:path';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { ensureCluster, clusterUrl, projectRoot, SetupError } from './postgres';

export const migrationsFolder = path.join(projectRoot, 'drizzle');

/** Creates the database named in `url` when it does not exist. */
export async function ensureDatabase(url: string): Promise<void> {
  const target = new URL(url);
  const name = decodeURIComponent(target.pathname.slice(1));
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new SetupError(`Unsupported database name "${name}".`);
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    const found = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`create database "${name}"`);
  } finally {
    await client.end();
  }
}

/** Applies pending Drizzle migrations on one dedicated connection; a second run is a no-op. */
export async function migrateDatabase(url: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await migrate(drizzle(client), { migrationsFolder });
  } catch (error) {
    throw new SetupError(
      `A migration failed: ${(error as Error).message}\nNothing of that migration was applied; fix it and run again.`,
    );
  } finally {
    await client.end();
  }
}

/**
 * Resolves the database URL for a purpose: DATABASE_URL (or TEST_DATABASE_URL
 * for tests) wins; otherwise the private cluster is started and used.
 */
export async function prepareDatabase(
  database: string,
  log: (m: string) => void,
  overrideVar: 'DATABASE_URL' | 'TEST_DATABASE_URL' = 'DATABASE_URL',
): Promise<string> {
  const override = process.env[overrideVar];
  const url = override && override.length > 0 ? override : clusterUrl(database);
  if (!override) await ensureCluster(log);
  await ensureDatabase(url);
  await migrateDatabase(url);
  return url;
}
