import { sql } from 'drizzle-orm';
import { boolean, check, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * People who may sign in. `password_hash` stays null until an invitee sets a password
 * through their one-time link; `email` is stored lower-case so uniqueness ignores case.
 * A `service` user never has a password: it acts only through API tokens.
 */
export const users = pgTable(
  'users',
  {
    id: text('id').primaryKey(),
    email: text('email').notNull().unique(),
    name: text('name').notNull(),
    role: text('role', { enum: ['admin', 'planner', 'approver', 'viewer'] }).notNull(),
    kind: text('kind', { enum: ['person', 'service'] })
      .notNull()
      .default('person'),
    disabled: boolean('disabled').notNull().default(false),
    passwordHash: text('password_hash'),
    passwordChangedAt: timestamp('password_changed_at', { withTimezone: true }),
    lastSignInAt: timestamp('last_sign_in_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    check('users_email_lower_case', sql`${t.email} = lower(${t.email})`),
    check('users_role_known', sql`${t.role} in ('admin', 'planner', 'approver', 'viewer')`),
    check('users_kind_known', sql`${t.kind} in ('person', 'service')`),
    check('users_service_has_no_password', sql`${t.kind} = 'person' or ${t.passwordHash} is null`),
  ],
);

export type UserRow = typeof users.$inferSelect;
