/**
 * Writing and reading the audit trail. Rows record who, what, when (UTC) and from where;
 * the table is append-only (a trigger refuses UPDATE and DELETE). Never put passwords,
 * tokens or session ids in `details` (ASVS 5.0 16.2-16.4).
 */
import type { AuditFilters, AuditPage } from '@shared/schemas/audit';
import type { DbOrTx } from '../db/client';
import { getDb } from '../db/client';
import type { Actor } from '../http/request-context';
import { namesOfIds } from './audit-names.repo';
import { insertAuditEvent, listAuditEvents } from './audit.repo';

/**
 * Whom a row names when no user is signed in: the e-mail typed at a sign-in
 * attempt, a script's name, nothing at all for a background job.
 */
export interface AnonymousAuthor {
  readonly actorId?: string | null;
  readonly actorEmail?: string | null;
  readonly ip?: string | null;
}

/** No actor: what a background job records on its own. */
export const NO_ACTOR: AnonymousAuthor = {};

export interface AuditEventInput {
  /** Dotted verb, e.g. `auth.sign_in`, `user.role_changed`, `plan.approved`. */
  action: string;
  entityType?: string;
  entityId?: string;
  details?: Record<string, unknown>;
}

const isActor = (who: Actor | AnonymousAuthor): who is Actor => 'origin' in who;

/**
 * Appends one audit event, the only way any module writes one. Pass the transaction that
 * makes the change, so the event commits (or rolls back) with it:
 * `await recordAudit(tx, actor, { action: 'plan.approved', entityType: 'plan', entityId })`.
 */
export async function recordAudit(db: DbOrTx, who: Actor | AnonymousAuthor, event: AuditEventInput): Promise<void> {
  const author = isActor(who) ? { actorId: who.id, actorEmail: who.email, ip: who.ip } : who;
  await insertAuditEvent(db, { ...author, ...event });
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
