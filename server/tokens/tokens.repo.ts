/** Queries on the api_tokens table (the only place that reads or writes it). */
import { and, desc, eq, gt, inArray, isNull, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { users } from '../users/users.schema';
import { apiTokens, type ApiTokenRow } from './tokens.schema';

export type NewApiToken = typeof apiTokens.$inferInsert;

export async function insertToken(db: DbOrTx, token: NewApiToken): Promise<ApiTokenRow> {
  const [row] = await db.insert(apiTokens).values(token).returning();
  if (!row) throw new Error('Inserting the API token returned no row.');
  return row;
}

/** Tokens that were not revoked (expired ones included, so their owner sees them run out), newest first. */
export async function listUnrevokedTokens(db: DbOrTx, userIds: readonly string[]): Promise<ApiTokenRow[]> {
  if (userIds.length === 0) return [];
  return db
    .select()
    .from(apiTokens)
    .where(and(inArray(apiTokens.userId, [...userIds]), isNull(apiTokens.revokedAt)))
    .orderBy(desc(apiTokens.createdAt));
}

/** A usable token of the same name: names tell tokens apart in the audit trail. */
export async function findUsableTokenNamed(db: DbOrTx, userId: string, name: string): Promise<ApiTokenRow | undefined> {
  const [row] = await db
    .select()
    .from(apiTokens)
    .where(
      and(
        eq(apiTokens.userId, userId),
        sql`lower(${apiTokens.name}) = lower(${name})`,
        isNull(apiTokens.revokedAt),
        gt(apiTokens.expiresAt, sql`now()`),
      ),
    )
    .limit(1);
  return row;
}

export async function findToken(db: DbOrTx, id: string): Promise<ApiTokenRow | undefined> {
  const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, id));
  return row;
}

/** The token and the account it acts as, for authenticating a request. */
export async function findTokenWithUser(db: DbOrTx, id: string) {
  const [row] = await db
    .select({
      token: apiTokens,
      user: { id: users.id, email: users.email, name: users.name, role: users.role, disabled: users.disabled },
    })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .where(eq(apiTokens.id, id));
  return row;
}

export async function recordTokenUse(db: DbOrTx, id: string, ip: string): Promise<void> {
  await db.update(apiTokens).set({ lastUsedAt: new Date(), lastUsedIp: ip }).where(eq(apiTokens.id, id));
}

/** Revokes one token; undefined when it was already revoked (or never existed). */
export async function revokeToken(db: DbOrTx, id: string, by: string, reason: string): Promise<ApiTokenRow | undefined> {
  const [row] = await db
    .update(apiTokens)
    .set({ revokedAt: new Date(), revokedBy: by, revokedReason: reason })
    .where(and(eq(apiTokens.id, id), isNull(apiTokens.revokedAt)))
    .returning();
  return row;
}

/** Revokes every token of a user; returns the ids revoked. */
export async function revokeUserTokens(db: DbOrTx, userId: string, by: string, reason: string): Promise<string[]> {
  const rows = await db
    .update(apiTokens)
    .set({ revokedAt: new Date(), revokedBy: by, revokedReason: reason })
    .where(and(eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt)))
    .returning({ id: apiTokens.id });
  return rows.map((r) => r.id);
}
