/**
 * One database transaction shared by Drizzle and pg-boss, so that an entity
 * row, its progress row and its pg-boss job commit together or not at all:
 * no row without a job, no job without a row.
 */
import type pg from 'pg';
import { drizzle } from 'drizzle-orm/node-postgres';
import type PgBoss from 'pg-boss';
import { getPool, type Db } from '../db/client';
import * as schema from '../db/schema';

export interface JobTransaction {
  /** Drizzle on the transaction's connection. */
  readonly tx: Db;
  /** pg-boss's connection option on the same connection (pass as `db` to send). */
  readonly bossDb: PgBoss.Db;
}

export async function inJobTransaction<T>(work: (t: JobTransaction) => Promise<T>): Promise<T> {
  const client: pg.PoolClient = await getPool().connect();
  try {
    await client.query('begin');
    const tx = drizzle(client, { schema }) as unknown as Db;
    const bossDb: PgBoss.Db = { executeSql: (text, values) => client.query(text, values) };
    const result = await work({ tx, bossDb });
    await client.query('commit');
    return result;
  } catch (error) {
    await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}
