import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { StudyInputs, StudyResults } from '@shared/schemas/study';
import { runJobColumn, runSourceColumns } from '../runs/run-columns';

/**
 * Horizon studies (docs/model.md): closed-loop receding-horizon runs over a
 * period for several horizons and terminal rules, compared with the reference
 * path. Inputs are a snapshot like a plan's; results are written once by the
 * job, keyed by study id and input version. The job's state and progress live
 * in job_progress (`job_id`).
 */
export const horizonStudies = pgTable(
  'horizon_studies',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ...runSourceColumns(),
    periodStart: timestamp('period_start', { withTimezone: true }).notNull(),
    periodEnd: timestamp('period_end', { withTimezone: true }).notNull(),
    horizonsHours: doublePrecision('horizons_hours').array().notNull(),
    replanHours: doublePrecision('replan_hours').notNull(),
    terminalRules: text('terminal_rules').array().notNull(),
    initialSocPct: doublePrecision('initial_soc_pct').notNull(),
    inputs: jsonb('inputs').$type<StudyInputs>().notNull(),
    inputVersion: integer('input_version').notNull().default(1),
    createdBy: text('created_by').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    jobId: runJobColumn(),
    results: jsonb('results').$type<StudyResults>(),
    resultsInputVersion: integer('results_input_version'),
    resultsAt: timestamp('results_at', { withTimezone: true }),
    method: text('method'),
    errorMessage: text('error_message'),
  },
  (t) => [
    index('horizon_studies_site_created_idx').on(t.siteId, t.createdAt),
    check('horizon_studies_period_order', sql`${t.periodEnd} > ${t.periodStart}`),
    check('horizon_studies_replan_positive', sql`${t.replanHours} > 0`),
    check('horizon_studies_has_runs', sql`cardinality(${t.horizonsHours}) > 0 and cardinality(${t.terminalRules}) > 0`),
    check('horizon_studies_results_keyed', sql`(${t.results} is null) = (${t.resultsInputVersion} is null)`),
  ],
);

export type HorizonStudyRow = typeof horizonStudies.$inferSelect;
