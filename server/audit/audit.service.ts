/**
 * Writing and reading the audit trail. Rows record who, what, when (UTC) and from where;
 * the table is append-only (a trigger refuses UPDATE and DELETE). Never put passwords,
 * tokens or session ids in `details` (ASVS 5.0 16.2-16.4).
 */
import type { Request } from 'express';
import type { AuditFilters, AuditPage } from '@shared/schemas/audit';
import type { DbOrTx } from '../db/client';
import { getDb } from '../db/client';
import { clientIp } from '../auth/current-user';
import { namesOfIds } from './audit-names.repo';
import { insertAuditEvent, listAuditEvents } from './audit.repo';

/** Who acted: the request's signed-in user and address, or explicit fields (jobs, scripts). */
export interface AuditActor {
  actorId?: string | null;
  actorEmail?: string | null;
  ip?: string | null;
}

export interface AuditEventInput {
  /** Dotted verb, e.g. `auth.sign_in`, `user.role_changed`, `plan.approved`. */
  action: string;
  entityType?: string;
  entityId?: string;
  details?: Record<string, unknown>;
}

function actorOf(source: Request | AuditActor): AuditActor {
  if ('method' in source && 'headers' in source) {
    const req = source;
    return { actorId: req.user?.id ?? null, actorEmail: req.user?.email ?? null, ip: clientIp(req) };
  }
  return source;
}

/**
 * Appends one audit event. Pass the transaction that makes the change, so the event
 * commits (or rolls back) with it: `await recordAudit(tx, req, { action: 'plan.approved', entityType: 'plan', entityId })`.
 */
export async function recordAudit(db: DbOrTx, who: Request | AuditActor, event: AuditEventInput): Promise<void> {
  const actor = actorOf(who);
  await insertAuditEvent(db, { ...actor, ...event });
}

/** Ids in an event's details under keys such as siteId, batteryId, copyId or byPlanId. */
function detailIds(details: Record<string, unknown>): string[] {
  return Object.entries(details)
    .filter(([key, value]) => /Id$/.test(key) && typeof value === 'string')
    .map(([, value]) => value as string);
}

function mentionedIds(event: { entityId: string | null; details: Record<string, unknown> }): string[] {
  return [...(event.entityId ? [event.entityId] : []), ...detailIds(event.details)];
}

/** One page of the trail, newest first; `nextBefore` continues it. */
export async function readAuditTrail(q: AuditFilters): Promise<AuditPage> {
  const rows = await listAuditEvents(getDb(), {
    actionPrefix: q.action,
    actorEmailContains: q.actor,
    entityType: q.entityType,
    entityId: q.entityId,
    from: q.from,
    to: q.to,
    beforeId: q.before,
    limit: q.limit + 1,
  });
  const page = rows.slice(0, q.limit);
  const names = await namesOfIds(getDb(), page.flatMap(mentionedIds));
  return {
    events: page.map((r) => ({ ...r, at: r.at.toISOString(), entityName: r.entityId ? (names.get(r.entityId) ?? null) : null })),
    nextBefore: rows.length > q.limit ? (page.at(-1)?.id ?? null) : null,
    names: Object.fromEntries([...names].filter(([id]) => page.some((r) => detailIds(r.details).includes(id)))),
  };
}
