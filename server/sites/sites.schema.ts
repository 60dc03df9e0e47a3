import { sql } from 'drizzle-orm';
import { check, doublePrecision, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';

/**
 * Grid connection points (DESIGN section 2). Limits and the demand charge are
 * null when there is none, as in the engine's site JSON. `created_by` holds the
 * user id as text (session user ids are text); no foreign key, like audit_events,
 * so sites never block removing an account.
 */
export const sites = pgTable(
  'sites',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    name: text('name').notNull(),
    timezone: text('timezone').notNull(),
    importLimitKw: doublePrecision('import_limit_kw'),
    exportLimitKw: doublePrecision('export_limit_kw'),
    demandChargePerKw: doublePrecision('demand_charge_per_kw'),
    currency: text('currency').notNull().default('EUR'),
    defaultHorizonHours: integer('default_horizon_hours'),
    createdBy: text('created_by').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // Two sites with one name would be confused in every list and plan.
    uniqueIndex('sites_name_unique').on(sql`lower(${t.name})`),
    check('sites_limits_non_negative', sql`coalesce(${t.importLimitKw}, 0) >= 0 and coalesce(${t.exportLimitKw}, 0) >= 0`),
    check('sites_demand_charge_non_negative', sql`coalesce(${t.demandChargePerKw}, 0) >= 0`),
    check('sites_currency_iso', sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check('sites_horizon_range', sql`${t.defaultHorizonHours} is null or ${t.defaultHorizonHours} between 1 and 8784`),
  ],
);

export type SiteRow = typeof sites.$inferSelect;
