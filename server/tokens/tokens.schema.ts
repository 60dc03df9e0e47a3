import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from '../users/users.schema';

/**
 * API tokens. Only the SHA-256 of the 256-bit secret is stored, so a copy of the
 * database lets nobody call the API; the id is part of the token so a request finds
 * its row by id and compares the hash in constant time. Tokens are revoked, never
 * deleted, so the audit trail's token ids keep naming something.
 */
export const apiTokens = pgTable(
  'api_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    secretSha256: text('secret_sha256').notNull(),
    createdBy: text('created_by').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
    lastUsedIp: text('last_used_ip'),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    revokedBy: text('revoked_by'),
    /** `owner`, `admin`, `user disabled`: why it stopped working. */
    revokedReason: text('revoked_reason'),
  },
  (t) => [
    index('api_tokens_user_id_idx').on(t.userId),
    check('api_tokens_secret_sha256_hex', sql`${t.secretSha256} ~ '^[0-9a-f]{64}$'`),
    check('api_tokens_expiry_after_creation', sql`${t.expiresAt} > ${t.createdAt}`),
  ],
);

export type ApiTokenRow = typeof apiTokens.$inferSelect;
