import { and, desc, eq, gte, ilike, lt, lte, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { auditEvents } from './audit.schema';
import { currentAuditVia } from './audit-via';

export interface AuditInput {
  actorId?: string | null;
  actorEmail?: string | null;
  action: string;
  entityType?: string;
  entityId?: string;
  ip?: string | null;
  details?: Record<string, unknown>;
}

/**
 * Appends one audit event; pass the transaction so the event commits with the change it records.
 * A request made with an API token adds the token's name and id (server/audit/audit-via.ts).
 */
export async function insertAuditEvent(db: DbOrTx, event: AuditInput): Promise<void> {
  const via = currentAuditVia();
  await db.insert(auditEvents).values({
    actorId: event.actorId ?? null,
    actorEmail: event.actorEmail ?? null,
    action: event.action,
    entityType: event.entityType ?? null,
    entityId: event.entityId ?? null,
    ip: event.ip ?? null,
    via: via?.label ?? null,
    viaTokenId: via?.tokenId ?? null,
    details: event.details ?? {},
  });
}

export interface AuditFilter {
  action?: string;
  /** Matches `auth.` to every `auth.*` action. */
  actionPrefix?: string;
  actorEmail?: string;
  actorEmailContains?: string;
  entityType?: string;
  entityId?: string;
  from?: Date;
  to?: Date;
  /** Keyset paging: events with a smaller id than this (newest first). */
  beforeId?: number;
  limit: number;
}

/** LIKE patterns treat `%` and `_` as wildcards; user text must match literally. */
const likeLiteral = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function listAuditEvents(db: DbOrTx, f: AuditFilter) {
  const where: SQL[] = [];
  if (f.action) where.push(eq(auditEvents.action, f.action));
  if (f.actionPrefix) where.push(ilike(auditEvents.action, `${likeLiteral(f.actionPrefix)}%`));
  if (f.actorEmail) where.push(eq(auditEvents.actorEmail, f.actorEmail));
  if (f.actorEmailContains) where.push(ilike(auditEvents.actorEmail, `%${likeLiteral(f.actorEmailContains)}%`));
  if (f.entityType) where.push(eq(auditEvents.entityType, f.entityType));
  if (f.entityId) where.push(eq(auditEvents.entityId, f.entityId));
  if (f.from) where.push(gte(auditEvents.at, f.from));
  if (f.to) where.push(lte(auditEvents.at, f.to));
  if (f.beforeId) where.push(lt(auditEvents.id, f.beforeId));
  return db
    .select()
    .from(auditEvents)
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(auditEvents.id))
    .limit(f.limit);
}
