/** The only place the horizon preview reads the database: one plan's snapshot, nothing written. */
import { eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { plans } from '../plans/plans.schema';

/** The inputs snapshot and the plan's own delivery-window cost (when computed); no series are read. */
export async function findPlanForPreview(db: DbOrTx, id: string) {
  const [row] = await db
    .select({
      id: plans.id,
      inputVersion: plans.inputVersion,
      inputs: plans.inputs,
      planCost: sql<number | null>`(${plans.results}->'summary'->>'cost')::double precision`,
    })
    .from(plans)
    .where(eq(plans.id, id));
  return row;
}

export type PreviewPlanRow = NonNullable<Awaited<ReturnType<typeof findPlanForPreview>>>;
