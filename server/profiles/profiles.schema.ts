import { sql } from 'drizzle-orm';
import { boolean, check, customType, doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { sites } from '../sites/sites.schema';

/** PostgreSQL bytea as a Node Buffer (pg returns bytea as Buffer). */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

/**
 * Uploaded time series (DESIGN section 4): a regular series in the canonical unit
 * of its kind, the original file byte for byte with its SHA-256, and who
 * uploaded it. min/max/mean/count are kept so lists never read the values.
 */
export const profiles = pgTable(
  'profiles',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id, { onDelete: 'restrict' }),
    kind: text('kind', { enum: ['price', 'load', 'generation'] }).notNull(),
    name: text('name').notNull(),
    unit: text('unit').notNull(),
    sourceUnit: text('source_unit').notNull(),
    intervalEnding: boolean('interval_ending').notNull().default(false),
    startAt: timestamp('start_at', { withTimezone: true }).notNull(),
    stepMinutes: integer('step_minutes').notNull(),
    valueCount: integer('value_count').notNull(),
    values: doublePrecision('values').array().notNull(),
    filledIndexes: integer('filled_indexes')
      .array()
      .notNull()
      .default(sql`'{}'::integer[]`),
    minValue: doublePrecision('min_value').notNull(),
    maxValue: doublePrecision('max_value').notNull(),
    meanValue: doublePrecision('mean_value').notNull(),
    notes: text('notes')
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    originalFile: bytea('original_file').notNull(),
    originalFilename: text('original_filename').notNull(),
    originalSha256: text('original_sha256').notNull(),
    uploadedBy: text('uploaded_by').notNull(),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('profiles_site_kind_idx').on(t.siteId, t.kind),
    check('profiles_kind_known', sql`${t.kind} in ('price', 'load', 'generation')`),
    check('profiles_step_supported', sql`${t.stepMinutes} in (5, 15, 30, 60)`),
    check('profiles_value_count', sql`${t.valueCount} > 0 and cardinality(${t.values}) = ${t.valueCount}`),
    check('profiles_sha256_hex', sql`${t.originalSha256} ~ '^[0-9a-f]{64}$'`),
  ],
);

export type ProfileRow = typeof profiles.$inferSelect;
