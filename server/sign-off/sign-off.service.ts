/**
 * The sign-off workflow: draft → submitted → approved | rejected, superseding
 * and copying (README, "Sign-off and exports").
 * Each action is one transaction holding the state change, its history event
 * and its audit event; e-mails go out only after the commit.
 */
import type { SignOffAction } from '@shared/schemas/sign-off';
import { getDb, type DbOrTx } from '../db/client';
import { AppError, conflict, notFound } from '../http/app-error';
import { recordAudit } from '../audit/audit.service';
import type { PlanRow } from '../plans/plans.schema';
import { planChecksum } from './plan-checksum';
import {
  findPlanForSignOff,
  insertDraftCopy,
  lockBatteryApprovals,
  markApproved,
  markRejected,
  markSubmitted,
  supersedeOverlapping,
} from '../plans/plans.repo';
import { insertPlanEvent, type NewPlanEvent } from './sign-off.repo';
import { notifyDecision, notifySubmitted } from './sign-off-notify';
import type { Actor } from '../http/request-context';
import { refusal, VERB, type Step } from './sign-off-rules';

async function load(tx: DbOrTx, id: string) {
  const plan = await findPlanForSignOff(tx, id);
  if (!plan) throw notFound('The plan');
  return plan;
}

/** After an UPDATE that matched no row: say why from the plan as it is now. */
async function lostRace(tx: DbOrTx, id: string, step: Step, version: number, userId: string): Promise<AppError> {
  const now = await load(tx, id);
  return (
    refusal(now, step, version, userId) ??
    conflict('The plan changed while you were signing it off. Reload it and check it again.')
  );
}

function event(
  plan: PlanRow,
  actor: Actor,
  action: NewPlanEvent['action'],
  from: string,
  comment: string | null,
  details: Record<string, unknown> = {},
): NewPlanEvent {
  return {
    planId: plan.id,
    action,
    actorId: actor.id,
    actorName: actor.name,
    actorEmail: actor.email,
    fromStatus: from,
    toStatus: plan.status,
    version: plan.version,
    comment,
    details,
  };
}

/**
 * Runs an action's transaction; a refusal on segregation of duties is a refused
 * authorisation and goes to the audit trail (ASVS 5.0 16.3.2),
 * written after the rollback so it is kept.
 */
async function auditingRefusals<T>(actor: Actor, id: string, step: Step, run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (error instanceof AppError && error.status === 403) {
      await recordAudit(getDb(), actor, {
        action: 'access.denied',
        entityType: 'plan',
        entityId: id,
        details: { reason: `segregation of duties: the submitter may not ${VERB[step]} the plan` },
      });
    }
    throw error;
  }
}

export async function submitPlan(actor: Actor, id: string, body: SignOffAction): Promise<PlanRow> {
  const plan = await getDb().transaction(async (tx) => {
    const before = await load(tx, id);
    const refused = refusal(before, 'submitted', body.version, actor.id);
    if (refused) throw refused;
    const row = await markSubmitted(tx, id, body.version, actor.id);
    if (!row) throw await lostRace(tx, id, 'submitted', body.version, actor.id);
    await insertPlanEvent(tx, event(row, actor, 'submitted', before.status, body.comment ?? null));
    await recordAudit(tx, actor, {
      action: 'plan.submitted',
      entityType: 'plan',
      entityId: id,
      details: { version: row.version, comment: body.comment ?? null },
    });
    return row;
  });
  await notifySubmitted(actor, plan, body.comment);
  return plan;
}

export interface Approval {
  plan: PlanRow;
  supersededPlanIds: string[];
}

/**
 * Approves in one statement that only the first of concurrent approvers can
 * match, stores the checksum of exactly the content that was read (the
 * fingerprint condition), and supersedes older approved plans of the battery
 * whose windows overlap, all in one transaction.
 */
export async function approvePlan(actor: Actor, id: string, body: SignOffAction): Promise<Approval> {
  const outcome = await auditingRefusals(actor, id, 'approved', () => approveInTransaction(actor, id, body));
  await notifyDecision(actor, outcome.plan, 'approved', body.comment);
  return outcome;
}

function approveInTransaction(actor: Actor, id: string, body: SignOffAction): Promise<Approval> {
  return getDb().transaction(async (tx) => {
    const before = await load(tx, id);
    const refused = refusal(before, 'approved', body.version, actor.id);
    if (refused) throw refused;
    await lockBatteryApprovals(tx, before.batteryId);
    const checksum = planChecksum({ planId: before.id, inputs: before.inputs, results: before.results });
    const row = await markApproved(tx, {
      id,
      version: body.version,
      userId: actor.id,
      comment: body.comment ?? null,
      checksum,
      fingerprint: before.fingerprint,
    });
    if (!row) throw await lostRace(tx, id, 'approved', body.version, actor.id);
    await insertPlanEvent(tx, event(row, actor, 'approved', before.status, body.comment ?? null, { checksum }));
    await recordAudit(tx, actor, {
      action: 'plan.approved',
      entityType: 'plan',
      entityId: id,
      details: { version: row.version, checksum, comment: body.comment ?? null },
    });

    const superseded = await supersedeOverlapping(tx, {
      newId: id,
      batteryId: row.batteryId,
      start: row.deliveryStart,
      end: row.deliveryEnd,
    });
    for (const old of superseded) {
      await insertPlanEvent(tx, {
        planId: old.id,
        action: 'superseded',
        actorId: actor.id,
        actorName: actor.name,
        actorEmail: actor.email,
        fromStatus: 'approved',
        toStatus: 'superseded',
        version: old.version,
        comment: null,
        details: { supersededBy: id },
      });
      await recordAudit(tx, actor, {
        action: 'plan.superseded',
        entityType: 'plan',
        entityId: old.id,
        details: { supersededBy: id },
      });
    }
    return { plan: row, supersededPlanIds: superseded.map((s) => s.id) };
  });
}

export async function rejectPlan(actor: Actor, id: string, body: { comment: string; version: number }): Promise<PlanRow> {
  const plan = await auditingRefusals(actor, id, 'rejected', () => rejectInTransaction(actor, id, body));
  await notifyDecision(actor, plan, 'rejected', body.comment);
  return plan;
}

function rejectInTransaction(actor: Actor, id: string, body: { comment: string; version: number }): Promise<PlanRow> {
  return getDb().transaction(async (tx) => {
    const before = await load(tx, id);
    const refused = refusal(before, 'rejected', body.version, actor.id);
    if (refused) throw refused;
    const row = await markRejected(tx, id, body.version, actor.id, body.comment);
    if (!row) throw await lostRace(tx, id, 'rejected', body.version, actor.id);
    await insertPlanEvent(tx, event(row, actor, 'rejected', before.status, body.comment));
    await recordAudit(tx, actor, {
      action: 'plan.rejected',
      entityType: 'plan',
      entityId: id,
      details: { version: row.version, comment: body.comment },
    });
    return row;
  });
}

/** A rejected plan becomes a new draft with the same parameters, snapshot and results. */
export async function copyPlan(actor: Actor, id: string): Promise<PlanRow> {
  return getDb().transaction(async (tx) => {
    const source = await load(tx, id);
    if (source.status !== 'rejected') {
      throw new AppError('wrong_status', `The plan is ${source.status}; only a rejected plan is copied into a new draft.`, 409);
    }
    const copy = await insertDraftCopy(tx, source, actor.id);
    await insertPlanEvent(tx, event(source, actor, 'copied', source.status, null, { copyId: copy.id }));
    await recordAudit(tx, actor, {
      action: 'plan.copied',
      entityType: 'plan',
      entityId: copy.id,
      details: { copiedFrom: id },
    });
    return copy;
  });
}
