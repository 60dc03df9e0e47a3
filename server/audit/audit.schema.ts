import { bigserial, index, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Append-only trail of who did what and when; a trigger refuses UPDATE and DELETE. */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorId: text('actor_id'),
    actorEmail: text('actor_email'),
    action: text('action').notNull(),
    entityType: text('entity_type'),
    entityId: text('entity_id'),
    ip: text('ip'),
    /** How the actor reached us when not by a browser session, e.g. `token nightly push`. */
    via: text('via'),
    viaTokenId: text('via_token_id'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index('audit_events_at_idx').on(t.at), index('audit_events_action_idx').on(t.action)],
);
