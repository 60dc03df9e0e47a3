import { sql } from 'drizzle-orm';
import { check, integer, jsonb, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from '../users/users.schema';

/**
 * Answers to `POST` requests sent with an `Idempotency-Key` header, kept 24 hours per
 * user, key and route, so a client that retries after a lost answer gets the same
 * answer instead of a second plan or upload. `in_flight` marks a request still running.
 */
export const idempotentRequests = pgTable(
  'idempotent_requests',
  {
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    key: text('key').notNull(),
    /** Method and path as sent, e.g. `POST /api/sites/<id>/profiles`. */
    route: text('route').notNull(),
    /** SHA-256 of the request body (and uploaded file), to refuse a key reused for another request. */
    fingerprint: text('fingerprint').notNull(),
    state: text('state', { enum: ['in_flight', 'done'] }).notNull(),
    responseStatus: integer('response_status'),
    responseBody: jsonb('response_body'),
    responseLocation: text('response_location'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.userId, t.key, t.route] }),
    check('idempotent_requests_state_known', sql`${t.state} in ('in_flight', 'done')`),
    check('idempotent_requests_done_has_status', sql`${t.state} = 'in_flight' or ${t.responseStatus} is not null`),
  ],
);

export type IdempotentRequestRow = typeof idempotentRequests.$inferSelect;
