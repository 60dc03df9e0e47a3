/**
 * What the plan page's sign-off panel and the "awaiting my sign-off" list
 * show: who submitted, who signed off, when, the checksum (recomputed now),
 * the full history, and what the signed-in user may do next.
 */
import { can } from '@shared/schemas/auth';
import type { AuthUser } from '@shared/schemas/auth';
import type { PendingSignOff, PersonAt, PlanEvent, SignOffRecord } from '@shared/schemas/sign-off';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import type { PlanRow } from '../plans/plans.schema';
import { checksumMatches } from './plan-checksum';
import { findPlanForSignOff, listAwaitingSignOff } from '../plans/plans.repo';
import { findPeople, type Person } from '../users/users.repo';
import { listPlanEvents } from './sign-off.repo';

function personAt(people: Map<string, Person>, id: string | null, at: Date | null): PersonAt | null {
  if (!id || !at) return null;
  const p = people.get(id);
  return { id, name: p?.name ?? null, email: p?.email ?? null, at: at.toISOString() };
}

/** True when the stored checksum still matches the stored inputs and results; null before approval. */
export function verifyPlanChecksum(plan: Pick<PlanRow, 'id' | 'status' | 'checksum' | 'inputs' | 'results'>): boolean | null {
  if (plan.status !== 'approved' && plan.status !== 'superseded') return null;
  return checksumMatches(plan.checksum, { planId: plan.id, inputs: plan.inputs, results: plan.results });
}

export function allowedActions(plan: PlanRow, user: AuthUser): SignOffRecord['can'] {
  const hasResults = plan.results !== null;
  const mayApprove = can(user.role, 'plans.approve') && plan.status === 'submitted' && plan.submittedBy !== user.id;
  return {
    submit: can(user.role, 'data.edit') && plan.status === 'draft' && hasResults,
    approve: mayApprove,
    reject: mayApprove,
    copy: can(user.role, 'data.edit') && plan.status === 'rejected',
    // Viewers export approved plans only (README, "Sign-off and exports").
    export: hasResults && (user.role !== 'viewer' || plan.status === 'approved'),
  };
}

export async function signOffRecord(id: string, user: AuthUser): Promise<SignOffRecord> {
  const db = getDb();
  const plan = await findPlanForSignOff(db, id);
  if (!plan) throw notFound('The plan');
  const events = await listPlanEvents(db, id);
  const people = await findPeople(
    db,
    [plan.createdBy, plan.submittedBy, plan.approvedBy, plan.rejectedBy].filter((x): x is string => !!x),
  );
  return {
    planId: plan.id,
    status: plan.status,
    version: plan.version,
    created: personAt(people, plan.createdBy, plan.createdAt),
    submitted: personAt(people, plan.submittedBy, plan.submittedAt),
    approved:
      plan.approvedBy && plan.approvedAt
        ? { ...(personAt(people, plan.approvedBy, plan.approvedAt) as PersonAt), comment: plan.approvalComment }
        : null,
    rejected:
      plan.rejectedBy && plan.rejectedAt
        ? { ...(personAt(people, plan.rejectedBy, plan.rejectedAt) as PersonAt), comment: plan.rejectionComment }
        : null,
    superseded:
      plan.supersededAt && plan.supersededBy ? { at: plan.supersededAt.toISOString(), byPlanId: plan.supersededBy } : null,
    checksum: plan.checksum,
    checksumVerified: verifyPlanChecksum(plan),
    copiedFrom: plan.copiedFrom,
    events: events.map((e): PlanEvent => ({
      id: e.id,
      at: e.at.toISOString(),
      action: e.action,
      actorId: e.actorId,
      actorName: e.actorName,
      actorEmail: e.actorEmail,
      fromStatus: e.fromStatus,
      toStatus: e.toStatus,
      version: e.version,
      comment: e.comment,
      details: e.details,
    })),
    can: allowedActions(plan, user),
  };
}

export async function pendingSignOffs(user: AuthUser): Promise<PendingSignOff[]> {
  const db = getDb();
  const rows = await listAwaitingSignOff(db, user.id);
  const people = await findPeople(
    db,
    rows.map((r) => r.submittedBy).filter((x): x is string => !!x),
  );
  return rows.map((r) => ({
    planId: r.id,
    version: r.version,
    siteId: r.siteId,
    siteName: r.inputs.site?.name ?? null,
    batteryName: r.inputs.battery?.name ?? null,
    deliveryStart: r.deliveryStart.toISOString(),
    deliveryEnd: r.deliveryEnd.toISOString(),
    submittedAt: r.submittedAt?.toISOString() ?? null,
    submittedBy: {
      id: r.submittedBy ?? '',
      name: people.get(r.submittedBy ?? '')?.name ?? null,
      email: people.get(r.submittedBy ?? '')?.email ?? null,
    },
  }));
}
