/**
 * Throw-away databases on the test cluster, for tests that need one of their own:
 * "empty" that really is empty, or data no other test file running at the same time can touch.
 */
import pg from 'pg';
import { testDatabaseUrl } from './database-url';

/** The URL of database `name` on the test database's server. */
export function databaseUrlFor(name: string): string {
  const url = new URL(testDatabaseUrl());
  url.pathname = `/${name}`;
  return url.toString();
}

/** One statement on its own connection, for databases the app's pool does not serve. */
export async function sqlAt<T extends pg.QueryResultRow>(url: string, text: string, params: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(text, params)).rows;
  } finally {
    await client.end();
  }
}

/** A database name unique to this test run, its URL, and how to drop it afterwards. */
export function scratchDatabase(purpose: string) {
  const name = `slackwater_${purpose}_${process.pid}_${Date.now()}`;
  return {
    name,
    url: databaseUrlFor(name),
    drop: () => dropDatabase(name),
  };
}

export async function dropDatabase(name: string): Promise<void> {
  await sqlAt(databaseUrlFor('postgres'), `drop database if exists "${name}" with (force)`);
}
