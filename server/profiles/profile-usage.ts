/**
 * Which plans rest on a profile. Submitted and approved plans protect their
 * input profiles from deletion: a signed (or to-be-signed) plan must stay
 * checkable against the data it was solved on. Draft, rejected and superseded
 * plans are also held by the plans table's foreign keys (ON DELETE RESTRICT),
 * which the service turns into its own 409.
 */
import { and, asc, eq, inArray, or } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { plans } from '../plans/plans.schema';

export interface PlanUsingProfile {
  id: string;
  status: string;
}

export const PROTECTING_STATUSES = ['submitted', 'approved'] as const;

export async function findProtectingPlans(db: DbOrTx, profileId: string, limit = 10): Promise<PlanUsingProfile[]> {
  return db
    .select({ id: plans.id, status: plans.status })
    .from(plans)
    .where(
      and(
        inArray(plans.status, [...PROTECTING_STATUSES]),
        or(eq(plans.priceProfileId, profileId), eq(plans.loadProfileId, profileId), eq(plans.generationProfileId, profileId)),
      ),
    )
    .orderBy(asc(plans.id))
    .limit(limit);
}
