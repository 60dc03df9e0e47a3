import { sql } from 'drizzle-orm';
import { getDb } from '../db/client';

/** True when a query against PostgreSQL succeeds. */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await getDb().execute(sql`select 1`);
    return true;
  } catch {
    return false;
  }
}
