import { sql } from 'drizzle-orm';
import { check, doublePrecision, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sites } from '../sites/sites.schema';

/**
 * Storage assets at a site, every parameter of the model (docs/model.md) (units in the
 * column names). Plans copy these values into their inputs snapshot, so editing
 * a battery never changes a signed plan. `version` guards concurrent edits.
 */
export const batteries = pgTable(
  'batteries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id, { onDelete: 'restrict' }),
    name: text('name').notNull(),
    powerChargeKw: doublePrecision('power_charge_kw').notNull(),
    powerDischargeKw: doublePrecision('power_discharge_kw').notNull(),
    energyKwh: doublePrecision('energy_kwh').notNull(),
    socMinPct: doublePrecision('soc_min_pct').notNull(),
    socMaxPct: doublePrecision('soc_max_pct').notNull(),
    socInitialPct: doublePrecision('soc_initial_pct').notNull(),
    efficiencyCharge: doublePrecision('efficiency_charge').notNull(),
    efficiencyDischarge: doublePrecision('efficiency_discharge').notNull(),
    selfDischargePctPerHour: doublePrecision('self_discharge_pct_per_hour').notNull(),
    degradationCostPerMwh: doublePrecision('degradation_cost_per_mwh').notNull(),
    maxCyclesPerDay: doublePrecision('max_cycles_per_day'),
    version: integer('version').notNull().default(1),
    createdBy: text('created_by').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('batteries_site_name_unique').on(t.siteId, sql`lower(${t.name})`),
    // The same rules as shared/schemas/battery.ts, so no path around the API stores an unsolvable battery.
    check('batteries_power_positive', sql`${t.powerChargeKw} > 0 and ${t.powerDischargeKw} > 0 and ${t.energyKwh} > 0`),
    check(
      'batteries_soc_window',
      sql`0 <= ${t.socMinPct} and ${t.socMinPct} < ${t.socMaxPct} and ${t.socMaxPct} <= 100 and ${t.socInitialPct} between ${t.socMinPct} and ${t.socMaxPct}`,
    ),
    check(
      'batteries_efficiency_range',
      sql`${t.efficiencyCharge} > 0 and ${t.efficiencyCharge} <= 1 and ${t.efficiencyDischarge} > 0 and ${t.efficiencyDischarge} <= 1`,
    ),
    check(
      'batteries_costs_non_negative',
      sql`${t.selfDischargePctPerHour} >= 0 and ${t.selfDischargePctPerHour} < 100 and ${t.degradationCostPerMwh} >= 0`,
    ),
    check('batteries_cycles_positive', sql`${t.maxCyclesPerDay} is null or ${t.maxCyclesPerDay} > 0`),
  ],
);

export type BatteryRow = typeof batteries.$inferSelect;
