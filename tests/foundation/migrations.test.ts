import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureDatabase, migrateDatabase } from '../../scripts/lib/database';
import { scratchDatabase, sqlAt } from '../support/scratch-database';

// A throw-away database per run, so "empty" really means empty.
const scratch = scratchDatabase('migrate');
const scratchUrl = scratch.url;

describe('database migrations', () => {
  beforeAll(async () => {
    await ensureDatabase(scratchUrl);
  });
  afterAll(async () => {
    await scratch.drop();
  });

  it('apply to an empty database and a second run changes nothing', async () => {
    await migrateDatabase(scratchUrl);
    const tablesAfterFirst = await sqlAt<{ table_name: string }>(
      scratchUrl,
      "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
    );
    const applied = await sqlAt<{ n: string }>(scratchUrl, 'select count(*)::text as n from drizzle.__drizzle_migrations');
    expect(tablesAfterFirst.map((t) => t.table_name)).toContain('audit_events');

    await migrateDatabase(scratchUrl);
    const tablesAfterSecond = await sqlAt<{ table_name: string }>(
      scratchUrl,
      "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
    );
    const appliedAgain = await sqlAt<{ n: string }>(scratchUrl, 'select count(*)::text as n from drizzle.__drizzle_migrations');
    expect(tablesAfterSecond).toEqual(tablesAfterFirst);
    expect(appliedAgain[0]?.n).toBe(applied[0]?.n);
  });

  it('keeps the audit trail append-only in the database itself', async () => {
    await migrateDatabase(scratchUrl);
    await sqlAt(scratchUrl, "insert into audit_events (action) values ('test.event')");
    await expect(sqlAt(scratchUrl, "update audit_events set action = 'changed'")).rejects.toThrow(/append-only/);
    await expect(sqlAt(scratchUrl, 'delete from audit_events')).rejects.toThrow(/append-only/);
  });
});
