/** Job lists with what each job computes (plan or study, battery, window), for the attention page. */
import { desc, eq, inArray, sql } from 'drizzle-orm';
import type { JobKind, JobState } from '@shared/schemas/job';
import type { DbOrTx } from '../db/client';
import { batteries } from '../batteries/batteries.schema';
import { plans } from '../plans/plans.schema';
import { horizonStudies } from '../studies/studies.schema';
import { jobProgress } from './jobs.schema';

export async function listJobsWithSubjects(db: DbOrTx, filter: { states?: readonly JobState[]; kind?: JobKind; limit: number }) {
  return db
    .select({
      job: jobProgress,
      siteId: sql<string | null>`coalesce(${plans.siteId}, ${horizonStudies.siteId})`,
      batteryName: batteries.name,
      periodStart: sql<string | null>`coalesce(${plans.deliveryStart}, ${horizonStudies.periodStart})`,
      periodEnd: sql<string | null>`coalesce(${plans.deliveryEnd}, ${horizonStudies.periodEnd})`,
    })
    .from(jobProgress)
    .leftJoin(plans, eq(plans.jobId, jobProgress.jobId))
    .leftJoin(horizonStudies, eq(horizonStudies.jobId, jobProgress.jobId))
    .leftJoin(batteries, sql`${batteries.id} = coalesce(${plans.batteryId}, ${horizonStudies.batteryId})`)
    .where(
      sql`${filter.states ? inArray(jobProgress.state, [...filter.states]) : sql`true`} and ${filter.kind ? eq(jobProgress.kind, filter.kind) : sql`true`}`,
    )
    .orderBy(desc(jobProgress.createdAt))
    .limit(filter.limit);
}
