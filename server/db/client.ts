/** The process's one connection pool and Drizzle instance. */
import pg from 'pg';
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle has the same query API as the database. */
export type DbOrTx = Db | Parameters<Parameters<Db['transaction']>[0]>[0];

let pool: pg.Pool | null = null;
let db: Db | null = null;

export function initDb(url: string, max = 10): Db {
  if (db) return db;
  pool = new pg.Pool({ connectionString: url, max, connectionTimeoutMillis: 5000 });
  // An idle client losing its connection must not crash the process.
  pool.on('error', () => undefined);
  db = drizzle(pool, { schema });
  return db;
}

export function getDb(): Db {
  if (!db) throw new Error('The database is not initialised: call initDb(url) at start-up.');
  return db;
}

export function getPool(): pg.Pool {
  if (!pool) throw new Error('The database is not initialised: call initDb(url) at start-up.');
  return pool;
}

export async function closeDb(): Promise<void> {
  await pool?.end();
  pool = null;
  db = null;
}
