import { sql } from 'drizzle-orm';
import {
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import type { PlanInputs, PlanResults } from '@shared/schemas/plan';
import { runJobColumn, runSourceColumns } from '../runs/run-columns';

/**
 * Dispatch plans (docs/model.md). `inputs` is the snapshot taken at
 * creation (battery and site parameters copied, profiles named by id and
 * SHA-256), so a later edit of the battery never changes the plan. `results`
 * is written once, by the job, together with `results_input_version`.
 * Sign-off columns are filled by the sign-off module; user ids are text
 * without foreign keys, like the other tables, so plans never block removing an account.
 */
export const plans = pgTable(
  'plans',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ...runSourceColumns(),
    deliveryStart: timestamp('delivery_start', { withTimezone: true }).notNull(),
    deliveryEnd: timestamp('delivery_end', { withTimezone: true }).notNull(),
    horizonHours: doublePrecision('horizon_hours').notNull(),
    /** `free`, `cyclic`, `steady-value` or `target:<pct>`. */
    terminalRule: text('terminal_rule').notNull(),
    initialSocPct: doublePrecision('initial_soc_pct').notNull(),
    inputs: jsonb('inputs').$type<PlanInputs>().notNull(),
    /** Bumped if the inputs are ever recomputed; results are keyed by plan id and this. */
    inputVersion: integer('input_version').notNull().default(1),
    status: text('status', { enum: ['draft', 'submitted', 'approved', 'rejected', 'superseded'] })
      .notNull()
      .default('draft'),
    /** Optimistic locking for sign-off actions (409 on a stale version). */
    version: integer('version').notNull().default(1),
    createdBy: text('created_by').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    submittedBy: text('submitted_by'),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
    approvedBy: text('approved_by'),
    approvedAt: timestamp('approved_at', { withTimezone: true }),
    approvalComment: text('approval_comment'),
    rejectedBy: text('rejected_by'),
    rejectedAt: timestamp('rejected_at', { withTimezone: true }),
    rejectionComment: text('rejection_comment'),
    supersededAt: timestamp('superseded_at', { withTimezone: true }),
    supersededBy: uuid('superseded_by').references((): AnyPgColumn => plans.id, { onDelete: 'restrict' }),
    copiedFrom: uuid('copied_from').references((): AnyPgColumn => plans.id, { onDelete: 'restrict' }),
    /** SHA-256 over inputs and results, stored at approval. */
    checksum: text('checksum'),
    jobId: runJobColumn(),
    results: jsonb('results').$type<PlanResults>(),
    resultsInputVersion: integer('results_input_version'),
    resultsAt: timestamp('results_at', { withTimezone: true }),
    /** `dp` or `lp`: which engine path produced the results. */
    method: text('method'),
    /** Why the job produced no results (the engine's message), shown on the plan page. */
    errorMessage: text('error_message'),
  },
  (t) => [
    index('plans_site_created_idx').on(t.siteId, t.createdAt),
    index('plans_battery_window_idx').on(t.batteryId, t.deliveryStart, t.deliveryEnd),
    index('plans_status_idx').on(t.status),
    check('plans_status_known', sql`${t.status} in ('draft', 'submitted', 'approved', 'rejected', 'superseded')`),
    check('plans_window_order', sql`${t.deliveryEnd} > ${t.deliveryStart}`),
    check('plans_horizon_positive', sql`${t.horizonHours} > 0 and ${t.horizonHours} <= 8784`),
    check('plans_terminal_rule_known', sql`${t.terminalRule} ~ '^(free|cyclic|steady-value|target:[0-9]+(\\.[0-9]+)?)$'`),
    check('plans_initial_soc_range', sql`${t.initialSocPct} >= 0 and ${t.initialSocPct} <= 100`),
    check('plans_results_keyed', sql`(${t.results} is null) = (${t.resultsInputVersion} is null)`),
  ],
);

export type PlanRow = typeof plans.$inferSelect;
