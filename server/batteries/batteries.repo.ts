import { and, asc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { batteries, type BatteryRow } from './batteries.schema';

export type BatteryValues = Omit<typeof batteries.$inferInsert, 'id' | 'version' | 'createdAt' | 'updatedAt'>;

export async function listBatteries(db: DbOrTx, siteId: string): Promise<BatteryRow[]> {
  return db
    .select()
    .from(batteries)
    .where(eq(batteries.siteId, siteId))
    .orderBy(asc(sql`lower(${batteries.name})`));
}

export async function findBattery(db: DbOrTx, id: string): Promise<BatteryRow | undefined> {
  const [row] = await db.select().from(batteries).where(eq(batteries.id, id));
  return row;
}

export async function insertBattery(db: DbOrTx, values: BatteryValues): Promise<BatteryRow> {
  const [row] = await db.insert(batteries).values(values).returning();
  if (!row) throw new Error('insert into batteries returned no row');
  return row;
}

/**
 * Applies `values` only when the stored version is still `version`, bumping it;
 * no row back means someone else saved first (or the battery is gone).
 */
export async function updateBatteryAtVersion(
  db: DbOrTx,
  id: string,
  version: number,
  values: Partial<BatteryValues>,
): Promise<BatteryRow | undefined> {
  const [row] = await db
    .update(batteries)
    .set({ ...values, version: sql`${batteries.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(batteries.id, id), eq(batteries.version, version)))
    .returning();
  return row;
}
