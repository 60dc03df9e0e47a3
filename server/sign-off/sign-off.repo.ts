/**
 * Every query of the sign-off workflow. The state changes are single
 * conditional UPDATEs: under Read Committed the row lock and the re-check of
 * the WHERE clause on the newest row version make exactly one of several
 * concurrent callers win; the others update zero rows (SECURITY.md, "the
 * approval race"; PostgreSQL manual 13.2.1 on UPDATE under Read Committed).
 */
import { and, asc, eq, gt, inArray, lt, ne, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { plans, type PlanRow } from '../plans/plans.schema';
import { users } from '../users/users.schema';
import { planEvents } from './sign-off.schema';

/** Content hash of the row's inputs and results as PostgreSQL prints them, to detect a change between read and update. */
const contentFingerprint = sql<string>`md5(${plans.inputs}::text || coalesce(${plans.results}::text, ''))`;

export async function findPlan(db: DbOrTx, id: string): Promise<(PlanRow & { fingerprint: string }) | null> {
  const [row] = await db.select({ plan: plans, fingerprint: contentFingerprint }).from(plans).where(eq(plans.id, id));
  return row ? { ...row.plan, fingerprint: row.fingerprint } : null;
}

/** Serialises approvals of one battery, so two overlapping plans approved at once cannot both stay current. */
export async function lockBatteryApprovals(tx: DbOrTx, batteryId: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext('slackwater.plans.approve'), hashtext(${batteryId}))`);
}

export async function markSubmitted(tx: DbOrTx, id: string, version: number, userId: string): Promise<PlanRow | null> {
  const [row] = await tx
    .update(plans)
    .set({
      status: 'submitted',
      submittedBy: userId,
      submittedAt: sql`now()`,
      version: sql`${plans.version} + 1`,
      updatedAt: sql`now()`,
    })
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
      version: sql`${plans.version} + 1`,
      updatedAt: sql`now()`,
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

export async function markRejected(
  tx: DbOrTx,
  id: string,
  version: number,
  userId: string,
  comment: string,
): Promise<PlanRow | null> {
  const [row] = await tx
    .update(plans)
    .set({
      status: 'rejected',
      rejectedBy: userId,
      rejectedAt: sql`now()`,
      rejectionComment: comment,
      version: sql`${plans.version} + 1`,
      updatedAt: sql`now()`,
    })
    .where(and(eq(plans.id, id), eq(plans.status, 'submitted'), eq(plans.version, version), ne(plans.submittedBy, userId)))
    .returning();
  return row ?? null;
}

/** Approved plans of the battery whose delivery window overlaps [start, end), other than `newId`, become superseded by it. */
export async function supersedeOverlapping(tx: DbOrTx, p: { newId: string; batteryId: string; start: Date; end: Date }) {
  return tx
    .update(plans)
    .set({
      status: 'superseded',
      supersededAt: sql`now()`,
      supersededBy: p.newId,
      version: sql`${plans.version} + 1`,
      updatedAt: sql`now()`,
    })
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

export type NewPlanEvent = typeof planEvents.$inferInsert;

export async function insertPlanEvent(tx: DbOrTx, event: NewPlanEvent): Promise<void> {
  await tx.insert(planEvents).values(event);
}

export function listPlanEvents(db: DbOrTx, planId: string) {
  return db.select().from(planEvents).where(eq(planEvents.planId, planId)).orderBy(asc(planEvents.id));
}

export interface Person {
  id: string;
  name: string;
  email: string;
  role: string;
  disabled: boolean;
}

export async function findPeople(db: DbOrTx, ids: readonly string[]): Promise<Map<string, Person>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await db
    .select({ id: users.id, name: users.name, email: users.email, role: users.role, disabled: users.disabled })
    .from(users)
    .where(inArray(users.id, unique));
  return new Map(rows.map((r) => [r.id, r]));
}

/** Who may sign off a plan: active approvers and admins with a password set, never the submitter. */
export function listSignOffRecipients(db: DbOrTx, submitterId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(
      and(
        inArray(users.role, ['approver', 'admin']),
        eq(users.disabled, false),
        sql`${users.passwordHash} is not null`,
        ne(users.id, submitterId),
      ),
    )
    .orderBy(asc(users.email));
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
