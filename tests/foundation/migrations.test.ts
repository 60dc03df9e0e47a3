import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { ensureDatabase, migrateDatabase } from '../../scripts/lib/database';
import { testDatabaseUrl } from '../support/database-url';

// A throw-away database per run, so "empty" really means empty.
const scratchName = `slackwater_migrate_${process.pid}_${Date.now()}`;
const scratchUrl = (() => {
  const url = new URL(testDatabaseUrl());
  url.pathname = `/${scratchName}`;
  return url.toString();
})();
const adminUrl = (() => {
  const url = new URL(testDatabaseUrl());
  url.pathname = '/postgres';
  return url.toString();
})();

async function query<T extends pg.QueryResultRow>(url: string, text: string) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(text)).rows;
  } finally {
    await client.end();
  }
}

describe('database migrations', () => {
  beforeAll(async () => {
    await ensureDatabase(scratchUrl);
  });
  afterAll(async () => {
    await query(adminUrl, `drop database if exists "${scratchName}" with (force)`);
  });

  it('apply to an empty database and a second run changes nothing', async () => {
    await migrateDatabase(scratchUrl);
    const tablesAfterFirst = await query<{ table_name: string }>(
      scratchUrl,
      "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
    );
    const applied = await query<{ n: string }>(scratchUrl, 'select count(*)::text as n from drizzle.__drizzle_migrations');
    expect(tablesAfterFirst.map((t) => t.table_name)).toContain('audit_events');

    await migrateDatabase(scratchUrl);
    const tablesAfterSecond = await query<{ table_name: string }>(
      scratchUrl,
      "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
    );
    const appliedAgain = await query<{ n: string }>(scratchUrl, 'select count(*)::text as n from drizzle.__drizzle_migrations');
    expect(tablesAfterSecond).toEqual(tablesAfterFirst);
    expect(appliedAgain[0]?.n).toBe(applied[0]?.n);
  });

  it('keeps the audit trail append-only in the database itself', async () => {
    await migrateDatabase(scratchUrl);
    await query(scratchUrl, "insert into audit_events (action) values ('test.event')");
    await expect(query(scratchUrl, "update audit_events set action = 'changed'")).rejects.toThrow(/append-only/);
    await expect(query(scratchUrl, 'delete from audit_events')).rejects.toThrow(/append-only/);
  });
});
