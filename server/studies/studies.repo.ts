/** The only place that queries the horizon_studies table. */
import { and, desc, eq, getTableColumns, inArray, sql, type SQL } from 'drizzle-orm';
import type { StudyListQuery, StudyRecommendation, StudyResults } from '@shared/schemas/study';
import { activeJobStates, type JobState } from '@shared/schemas/job';
import type { DbOrTx } from '../db/client';
import { sites } from '../sites/sites.schema';
import { batteries } from '../batteries/batteries.schema';
import { users } from '../users/users.schema';
import { runJobs as jobProgress } from '../runs/run-columns';
import { horizonStudies } from './studies.schema';

export async function insertStudy(db: DbOrTx, values: typeof horizonStudies.$inferInsert) {
  const [row] = await db.insert(horizonStudies).values(values).returning();
  if (!row) throw new Error('insert into horizon_studies returned no row');
  return row;
}

const names = { siteName: sites.name, batteryName: batteries.name, createdByName: users.name, job: jobProgress };

export async function findStudy(db: DbOrTx, id: string) {
  const [row] = await db
    .select({ study: horizonStudies, ...names })
    .from(horizonStudies)
    .leftJoin(sites, eq(sites.id, horizonStudies.siteId))
    .leftJoin(batteries, eq(batteries.id, horizonStudies.batteryId))
    .leftJoin(users, eq(users.id, horizonStudies.createdBy))
    .leftJoin(jobProgress, eq(jobProgress.jobId, horizonStudies.jobId))
    .where(eq(horizonStudies.id, id));
  return row;
}

const { results: _results, inputs: _inputs, ...withoutResults } = getTableColumns(horizonStudies);

export async function listStudies(db: DbOrTx, q: StudyListQuery) {
  const where: SQL[] = [];
  if (q.siteId) where.push(eq(horizonStudies.siteId, q.siteId));
  if (q.batteryId) where.push(eq(horizonStudies.batteryId, q.batteryId));
  if (q.status) {
    const states: readonly JobState[] = q.status === 'active' ? activeJobStates : [q.status];
    where.push(inArray(jobProgress.state, [...states]));
  }
  return db
    .select({
      study: withoutResults,
      ...names,
      recommendation: sql<StudyRecommendation | null>`${horizonStudies.results}->'recommendation'`,
    })
    .from(horizonStudies)
    .leftJoin(sites, eq(sites.id, horizonStudies.siteId))
    .leftJoin(batteries, eq(batteries.id, horizonStudies.batteryId))
    .leftJoin(users, eq(users.id, horizonStudies.createdBy))
    .leftJoin(jobProgress, eq(jobProgress.jobId, horizonStudies.jobId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(horizonStudies.createdAt), desc(horizonStudies.id))
    .limit(q.limit);
}

/** Stores the results once, keyed by study id and input version; false when already stored. */
export async function storeStudyResults(db: DbOrTx, id: string, inputVersion: number, results: StudyResults): Promise<boolean> {
  const rows = await db
    .update(horizonStudies)
    .set({ results, resultsInputVersion: inputVersion, resultsAt: sql`now()`, method: results.method, errorMessage: null })
    .where(and(eq(horizonStudies.id, id), eq(horizonStudies.inputVersion, inputVersion), sql`${horizonStudies.results} is null`))
    .returning({ id: horizonStudies.id });
  return rows.length === 1;
}

export async function recordStudyError(db: DbOrTx, id: string, message: string): Promise<void> {
  await db
    .update(horizonStudies)
    .set({ errorMessage: message })
    .where(and(eq(horizonStudies.id, id), sql`${horizonStudies.results} is null`));
}

/** Battery names and periods of studies, for the job list. */
export async function findStudySubjects(db: DbOrTx, ids: readonly string[]) {
  return db
    .select({
      id: horizonStudies.id,
      siteId: horizonStudies.siteId,
      batteryName: batteries.name,
      start: horizonStudies.periodStart,
      end: horizonStudies.periodEnd,
    })
    .from(horizonStudies)
    .leftJoin(batteries, eq(batteries.id, horizonStudies.batteryId))
    .where(inArray(horizonStudies.id, [...ids]));
}
