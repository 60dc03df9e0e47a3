/**
 * The queries of the plan_events table: the append-only sign-off history of a
 * plan. The plan's own state changes are in server/plans/plans.repo.ts.
 */
import { asc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { planEvents } from './sign-off.schema';

export type NewPlanEvent = typeof planEvents.$inferInsert;

export async function insertPlanEvent(tx: DbOrTx, event: NewPlanEvent): Promise<void> {
  await tx.insert(planEvents).values(event);
}

export function listPlanEvents(db: DbOrTx, planId: string) {
  return db.select().from(planEvents).where(eq(planEvents.planId, planId)).orderBy(asc(planEvents.id));
}
