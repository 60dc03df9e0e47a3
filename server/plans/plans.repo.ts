/** The only place that queries the plans table. */
import { and, desc, eq, getTableColumns, inArray, lte, sql, type SQL } from 'drizzle-orm';
import type { PlanListQuery, PlanResults } from '@shared/schemas/plan';
import { activeJobStates, type JobState } from '@shared/schemas/job';
import type { DbOrTx } from '../db/client';
import { sites } from '../sites/sites.schema';
import { batteries } from '../batteries/batteries.schema';
import { users } from '../users/users.schema';
import { runJobs as jobProgress } from '../runs/run-columns';
import { plans } from './plans.schema';

export type NewPlan = typeof plans.$inferInsert;

export async function insertPlan(db: DbOrTx, values: NewPlan) {
  const [row] = await db.insert(plans).values(values).returning();
  if (!row) throw new Error('insert into plans returned no row');
  return row;
}

/** A plan row with the names lists show and its job's progress row. */
const joined = {
  plan: plans,
  siteName: sites.name,
  batteryName: batteries.name,
  createdByName: users.name,
  job: jobProgress,
};

function selectJoined(db: DbOrTx) {
  return db
    .select(joined)
    .from(plans)
    .leftJoin(sites, eq(sites.id, plans.siteId))
    .leftJoin(batteries, eq(batteries.id, plans.batteryId))
    .leftJoin(users, eq(users.id, plans.createdBy))
    .leftJoin(jobProgress, eq(jobProgress.jobId, plans.jobId));
}

export type JoinedPlan = Awaited<ReturnType<typeof findPlan>> & object;

export async function findPlan(db: DbOrTx, id: string) {
  const [row] = await selectJoined(db).where(eq(plans.id, id));
  return row;
}

export async function listPlans(db: DbOrTx, q: PlanListQuery) {
  const where: SQL[] = [];
  if (q.siteId) where.push(eq(plans.siteId, q.siteId));
  if (q.batteryId) where.push(eq(plans.batteryId, q.batteryId));
  if (q.status) where.push(eq(plans.status, q.status));
  if (q.jobState) {
    const states: readonly JobState[] = q.jobState === 'active' ? activeJobStates : [q.jobState];
    where.push(inArray(jobProgress.state, [...states]));
  }
  if (q.deliveryStart) where.push(eq(plans.deliveryStart, q.deliveryStart));
  if (q.deliveryEnd) where.push(eq(plans.deliveryEnd, q.deliveryEnd));
  if (q.flagged === 'true') where.push(sql`jsonb_array_length(coalesce(${plans.results}->'turnpike'->'flags', '[]'::jsonb)) > 0`);
  if (q.flagged === 'false')
    where.push(sql`jsonb_array_length(coalesce(${plans.results}->'turnpike'->'flags', '[]'::jsonb)) = 0`);
  // Lists never carry the series: only the headline figures are read from results.
  return db
    .select({
      ...joined,
      plan: plansWithoutResults,
      headline: sql<PlanHeadline | null>`case when ${plans.results} is null then null else jsonb_build_object(
        'cost', ${plans.results}->'summary'->'cost',
        'earnings', ${plans.results}->'summary'->'earnings',
        'nearSteadyShare', ${plans.results}->'turnpike'->'nearSteadyShare',
        'flags', jsonb_array_length(coalesce(${plans.results}->'turnpike'->'flags', '[]'::jsonb))) end`,
    })
    .from(plans)
    .leftJoin(sites, eq(sites.id, plans.siteId))
    .leftJoin(batteries, eq(batteries.id, plans.batteryId))
    .leftJoin(users, eq(users.id, plans.createdBy))
    .leftJoin(jobProgress, eq(jobProgress.jobId, plans.jobId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(plans.createdAt), desc(plans.id))
    .limit(q.limit);
}

export interface PlanHeadline {
  cost: number;
  earnings: number;
  nearSteadyShare: number;
  flags: number;
}

const { results: _results, inputs: _inputs, ...plansWithoutResults } = getTableColumns(plans);

/**
 * Stores the results once: only while none are stored and the inputs are still
 * the version the job computed. False when another attempt stored them first.
 */
export async function storePlanResults(db: DbOrTx, id: string, inputVersion: number, results: PlanResults): Promise<boolean> {
  const rows = await db
    .update(plans)
    .set({
      results,
      resultsInputVersion: inputVersion,
      resultsAt: sql`now()`,
      method: results.method,
      errorMessage: null,
      updatedAt: sql`now()`,
    })
    .where(and(eq(plans.id, id), eq(plans.inputVersion, inputVersion), sql`${plans.results} is null`))
    .returning({ id: plans.id });
  return rows.length === 1;
}

export async function recordPlanError(db: DbOrTx, id: string, message: string): Promise<void> {
  await db
    .update(plans)
    .set({ errorMessage: message, updatedAt: sql`now()` })
    .where(and(eq(plans.id, id), sql`${plans.results} is null`));
}

/** The end SoC of the battery's latest approved plan that ends by `atOrBefore`. */
export async function lastApprovedEndSoc(db: DbOrTx, batteryId: string, atOrBefore: Date) {
  const [row] = await db
    .select({ id: plans.id, endSocPct: sql<number | null>`(${plans.results}->'summary'->>'endSocPct')::double precision` })
    .from(plans)
    .where(and(eq(plans.batteryId, batteryId), eq(plans.status, 'approved'), lte(plans.deliveryEnd, atOrBefore)))
    .orderBy(desc(plans.deliveryEnd), desc(plans.approvedAt))
    .limit(1);
  return row;
}

/** Battery names and delivery windows of plans, for the job list. */
export async function findPlanSubjects(db: DbOrTx, ids: readonly string[]) {
  return db
    .select({
      id: plans.id,
      siteId: plans.siteId,
      batteryName: batteries.name,
      start: plans.deliveryStart,
      end: plans.deliveryEnd,
    })
    .from(plans)
    .leftJoin(batteries, eq(batteries.id, plans.batteryId))
    .where(inArray(plans.id, [...ids]));
}
