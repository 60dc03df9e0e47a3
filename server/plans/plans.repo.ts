/**
 * The only place that queries the plans table: for the plans module itself,
 * the run kernel (last approved end SoC), the sign-off workflow, the export,
 * the horizon preview, profile deletion and the demo. The sign-off state
 * changes are single conditional UPDATEs: under Read Committed the row lock and
 * the re-check of the WHERE clause on the newest row version make exactly one
 * of several concurrent callers win; the others update zero rows (PostgreSQL
 * manual 13.2.1, UPDATE under Read Committed).
 */
import { and, asc, desc, eq, getTableColumns, gt, inArray, lt, lte, ne, or, sql, type SQL } from 'drizzle-orm';
import type { PlanListQuery, PlanResults } from '@shared/schemas/plan';
import { activeJobStates, type JobState } from '@shared/schemas/job';
import type { SelectedFields } from 'drizzle-orm/pg-core';
import type { DbOrTx } from '../db/client';
import { sites } from '../sites/sites.schema';
import { batteries } from '../batteries/batteries.schema';
import { users } from '../users/users.schema';
import { runJobs as jobProgress } from '../runs/run-columns';
import { plans, type PlanRow } from './plans.schema';

export type NewPlan = typeof plans.$inferInsert;

export async function insertPlan(db: DbOrTx, values: NewPlan) {
  const [row] = await db.insert(plans).values(values).returning();
  if (!row) throw new Error('insert into plans returned no row');
  return row;
}

/** The names lists show beside a plan, and its job's progress row. */
const names = { siteName: sites.name, batteryName: batteries.name, createdByName: users.name, job: jobProgress };

function selectJoined<T extends SelectedFields>(db: DbOrTx, columns: T) {
  return db
    .select({ ...columns, ...names })
    .from(plans)
    .leftJoin(sites, eq(sites.id, plans.siteId))
    .leftJoin(batteries, eq(batteries.id, plans.batteryId))
    .leftJoin(users, eq(users.id, plans.createdBy))
    .leftJoin(jobProgress, eq(jobProgress.jobId, plans.jobId));
}

export async function findPlan(db: DbOrTx, id: string) {
  const [row] = await selectJoined(db, { plan: plans }).where(eq(plans.id, id));
  return row;
}

export interface PlanHeadline {
  cost: number;
  earnings: number;
  nearSteadyShare: number;
  flags: number;
}

const { results: _results, inputs: _inputs, ...plansWithoutResults } = getTableColumns(plans);
const flagCount = sql`jsonb_array_length(coalesce(${plans.results}->'turnpike'->'flags', '[]'::jsonb))`;

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
  if (q.flagged === 'true') where.push(sql`${flagCount} > 0`);
  if (q.flagged === 'false') where.push(sql`${flagCount} = 0`);
  // Lists never carry the series: only the headline figures are read from results.
  return selectJoined(db, {
    plan: plansWithoutResults,
    headline: sql<PlanHeadline | null>`case when ${plans.results} is null then null else jsonb_build_object(
        'cost', ${plans.results}->'summary'->'cost',
        'earnings', ${plans.results}->'summary'->'earnings',
        'nearSteadyShare', ${plans.results}->'turnpike'->'nearSteadyShare',
        'flags', ${flagCount}) end`,
  })
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(plans.createdAt), desc(plans.id))
    .limit(q.limit);
}

/** True when the battery has any plan at all. */
export async function batteryHasPlans(db: DbOrTx, batteryId: string): Promise<boolean> {
  return (await db.select({ id: plans.id }).from(plans).where(eq(plans.batteryId, batteryId)).limit(1)).length > 0;
}

/** A plan row as stored (inputs and results included), for sign-off and export. */
export async function findPlanRow(db: DbOrTx, id: string): Promise<PlanRow | null> {
  const [row] = await db.select().from(plans).where(eq(plans.id, id));
  return row ?? null;
}

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

/** The inputs snapshot and the plan's own delivery-window cost and net cost (when computed), for the horizon preview; no series are read. */
export async function findPlanForPreview(db: DbOrTx, id: string) {
  const [row] = await db
    .select({
      id: plans.id,
      inputVersion: plans.inputVersion,
      inputs: plans.inputs,
      planCost: sql<number | null>`(${plans.results}->'summary'->>'cost')::double precision`,
      planNetCost: sql<number | null>`(${plans.results}->'summary'->>'netCost')::double precision`,
    })
    .from(plans)
    .where(eq(plans.id, id));
  return row;
}

/** Statuses whose plans keep their input profiles from deletion (a signed plan stays checkable against its data). */
const PROFILE_PROTECTING_STATUSES = ['submitted', 'approved'] as const;

/** Submitted and approved plans resting on a profile, a few at most. */
export async function findPlansProtectingProfile(db: DbOrTx, profileId: string, limit = 10) {
  return db
    .select({ id: plans.id, status: plans.status })
    .from(plans)
    .where(
      and(
        inArray(plans.status, [...PROFILE_PROTECTING_STATUSES]),
        or(eq(plans.priceProfileId, profileId), eq(plans.loadProfileId, profileId), eq(plans.generationProfileId, profileId)),
      ),
    )
    .orderBy(asc(plans.id))
    .limit(limit);
}

// Sign-off.

/** Content hash of the row's inputs and results as PostgreSQL prints them, to detect a change between read and update. */
const contentFingerprint = sql<string>`md5(${plans.inputs}::text || coalesce(${plans.results}::text, ''))`;

export async function findPlanForSignOff(db: DbOrTx, id: string): Promise<(PlanRow & { fingerprint: string }) | null> {
  const [row] = await db.select({ plan: plans, fingerprint: contentFingerprint }).from(plans).where(eq(plans.id, id));
  return row ? { ...row.plan, fingerprint: row.fingerprint } : null;
}

/** Serialises approvals of one battery, so two overlapping plans approved at once cannot both stay current. */
export async function lockBatteryApprovals(tx: DbOrTx, batteryId: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext('slackwater.plans.approve'), hashtext(${batteryId}))`);
}

const nextVersion = { version: sql`${plans.version} + 1`, updatedAt: sql`now()` };

export async function markSubmitted(tx: DbOrTx, id: string, version: number, userId: string): Promise<PlanRow | null> {
  const [row] = await tx
    .update(plans)
    .set({ status: 'submitted', submittedBy: userId, submittedAt: sql`now()`, ...nextVersion })
    .where(and(eq(plans.id, id), eq(plans.status, 'draft'), eq(plans.version, version), sql`${plans.results} is not null`))
    .returning();
  return row ?? null;
}

export interface ApprovalWrite {
  id: string;
  version: number;
  userId: string;
  comment: string | null;
  checksum: string;
  /** The fingerprint of the inputs and results the checksum was computed from. */
  fingerprint: string;
}

/** The one statement that approves: zero rows when another approver, a stale page or the submitter got there. */
export async function markApproved(tx: DbOrTx, a: ApprovalWrite): Promise<PlanRow | null> {
  const [row] = await tx
    .update(plans)
    .set({
      status: 'approved',
      approvedBy: a.userId,
      approvedAt: sql`now()`,
      approvalComment: a.comment,
      checksum: a.checksum,
      ...nextVersion,
    })
    .where(
      and(
        eq(plans.id, a.id),
        eq(plans.status, 'submitted'),
        eq(plans.version, a.version),
        ne(plans.submittedBy, a.userId),
        sql`${contentFingerprint} = ${a.fingerprint}`,
      ),
    )
    .returning();
  return row ?? null;
}

export async function markRejected(tx: DbOrTx, id: string, version: number, userId: string, comment: string) {
  const [row] = await tx
    .update(plans)
    .set({ status: 'rejected', rejectedBy: userId, rejectedAt: sql`now()`, rejectionComment: comment, ...nextVersion })
    .where(and(eq(plans.id, id), eq(plans.status, 'submitted'), eq(plans.version, version), ne(plans.submittedBy, userId)))
    .returning();
  return row ?? null;
}

/** Approved plans of the battery whose delivery window overlaps [start, end), other than `newId`, become superseded by it. */
export async function supersedeOverlapping(tx: DbOrTx, p: { newId: string; batteryId: string; start: Date; end: Date }) {
  return tx
    .update(plans)
    .set({ status: 'superseded', supersededAt: sql`now()`, supersededBy: p.newId, ...nextVersion })
    .where(
      and(
        eq(plans.batteryId, p.batteryId),
        eq(plans.status, 'approved'),
        ne(plans.id, p.newId),
        lt(plans.deliveryStart, p.end),
        gt(plans.deliveryEnd, p.start),
      ),
    )
    .returning({ id: plans.id, version: plans.version, deliveryStart: plans.deliveryStart, deliveryEnd: plans.deliveryEnd });
}

/** Submitted plans the user did not submit, oldest submission first. */
export function listAwaitingSignOff(db: DbOrTx, userId: string, limit = 100) {
  return db
    .select({
      id: plans.id,
      version: plans.version,
      siteId: plans.siteId,
      inputs: plans.inputs,
      deliveryStart: plans.deliveryStart,
      deliveryEnd: plans.deliveryEnd,
      submittedAt: plans.submittedAt,
      submittedBy: plans.submittedBy,
    })
    .from(plans)
    .where(and(eq(plans.status, 'submitted'), ne(plans.submittedBy, userId)))
    .orderBy(asc(plans.submittedAt))
    .limit(limit);
}

/**
 * A new draft with the rejected plan's parameters, inputs snapshot and results
 * (the results were computed from exactly that snapshot). It has no job of its
 * own and no sign-off columns; `copied_from` links it to the source.
 */
export async function insertDraftCopy(tx: DbOrTx, source: PlanRow, userId: string): Promise<PlanRow> {
  const [row] = await tx
    .insert(plans)
    .values({
      siteId: source.siteId,
      batteryId: source.batteryId,
      priceProfileId: source.priceProfileId,
      loadProfileId: source.loadProfileId,
      generationProfileId: source.generationProfileId,
      deliveryStart: source.deliveryStart,
      deliveryEnd: source.deliveryEnd,
      horizonHours: source.horizonHours,
      terminalRule: source.terminalRule,
      initialSocPct: source.initialSocPct,
      inputs: source.inputs,
      inputVersion: source.inputVersion,
      results: source.results,
      resultsInputVersion: source.resultsInputVersion,
      resultsAt: source.resultsAt,
      method: source.method,
      createdBy: userId,
      copiedFrom: source.id,
    })
    .returning();
  if (!row) throw new Error('The copy of the plan was not stored.');
  return row;
}

/** Signed-off plans in id order, a page at a time (results can be large). */
export function pageSignedOffPlans(db: DbOrTx, afterId: string | null, limit: number) {
  return db
    .select({ id: plans.id, status: plans.status, checksum: plans.checksum, inputs: plans.inputs, results: plans.results })
    .from(plans)
    .where(and(inArray(plans.status, ['approved', 'superseded']), afterId ? gt(plans.id, afterId) : undefined))
    .orderBy(asc(plans.id))
    .limit(limit);
}
