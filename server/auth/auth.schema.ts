import { bigserial, boolean, index, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from '../users/users.schema';

/**
 * Lucia's session table. `created_at` is ours: lucia v3 only knows the sliding
 * `expires_at`, so the 12-hour absolute lifetime is enforced from it (ASVS 4.0.3 3.3.2).
 */
export const sessions = pgTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('sessions_user_id_idx').on(t.userId)],
);

/**
 * Invitation and password-reset links. Only the SHA-256 of the token is stored, so a
 * copy of the database does not let anyone set a password.
 */
export const oneTimeTokens = pgTable(
  'one_time_tokens',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: ['invite', 'reset'] }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('one_time_tokens_user_id_idx').on(t.userId)],
);

/**
 * Sign-in and reset-request attempts, kept in the database so every process
 * counts the same failures (ASVS 4.0.3 2.2.1). Old rows are pruned.
 */
export const authAttempts = pgTable(
  'auth_attempts',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    kind: text('kind', { enum: ['sign-in', 'reset-request'] }).notNull(),
    email: text('email').notNull(),
    ip: text('ip').notNull(),
    success: boolean('success').notNull(),
  },
  (t) => [index('auth_attempts_email_idx').on(t.email, t.at), index('auth_attempts_ip_idx').on(t.ip, t.at)],
);
