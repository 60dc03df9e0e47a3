import { sql } from 'drizzle-orm';
import { bigserial, check, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { plans } from '../plans/plans.schema';

/**
 * The sign-off history of a plan, shown on the plan page: one row per submit,
 * approve, reject, supersede and copy, with who, when, the comment and the
 * plan version it produced. Append-only (a trigger refuses UPDATE, DELETE and
 * TRUNCATE), like audit_events; the foreign key keeps a plan with a history
 * from being deleted. Actor name and e-mail are copied so the history still
 * reads right after an account is renamed or removed.
 */
export const planEvents = pgTable(
  'plan_events',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    planId: uuid('plan_id')
      .notNull()
      .references(() => plans.id, { onDelete: 'restrict' }),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    action: text('action', { enum: ['submitted', 'approved', 'rejected', 'superseded', 'copied'] }).notNull(),
    actorId: text('actor_id'),
    actorName: text('actor_name'),
    actorEmail: text('actor_email'),
    fromStatus: text('from_status'),
    toStatus: text('to_status'),
    /** The plan's version after the action. */
    version: integer('version'),
    comment: text('comment'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [
    index('plan_events_plan_idx').on(t.planId, t.id),
    check('plan_events_action_known', sql`${t.action} in ('submitted', 'approved', 'rejected', 'superseded', 'copied')`),
  ],
);

export type PlanEventRow = typeof planEvents.$inferSelect;
