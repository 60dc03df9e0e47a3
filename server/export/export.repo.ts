/** The export's only queries: the plan and the names of the people who signed it off. */
import { eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { plans } from '../plans/plans.schema';
import { users } from '../users/users.schema';

export async function findPlanForExport(db: DbOrTx, id: string) {
  const [row] = await db.select().from(plans).where(eq(plans.id, id));
  return row ?? null;
}

export async function namesOf(db: DbOrTx, ids: readonly string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(inArray(users.id, [...new Set(ids)]));
  return new Map(rows.map((r) => [r.id, r.name]));
}
