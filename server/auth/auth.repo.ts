/** Queries behind sign-in, rate limiting and one-time links. */
import { and, count, eq, gte, isNull, lt, min, or, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { users } from '../users/users.schema';
import { authAttempts, oneTimeTokens, sessions } from './auth.schema';

export type AttemptKind = (typeof authAttempts.$inferInsert)['kind'];
export type LinkPurpose = (typeof oneTimeTokens.$inferInsert)['purpose'];

export { findUserByEmail, findUserById } from '../users/users.repo';

/**
 * Serialises attempts on one account across every process sharing the database, so
 * the failure count read before a check is still true when the attempt is recorded.
 */
export async function lockAccountAttempts(tx: DbOrTx, kind: AttemptKind, email: string) {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`${kind}:${email}`}))`);
}

export interface FailureCounts {
  byEmail: number;
  byIp: number;
  /** When the oldest counted failure leaves the window (for Retry-After). */
  oldestAt: Date | null;
}

export async function recentFailures(
  db: DbOrTx,
  kind: AttemptKind,
  email: string,
  ip: string,
  since: Date,
): Promise<FailureCounts> {
  const window = and(eq(authAttempts.kind, kind), eq(authAttempts.success, false), gte(authAttempts.at, since));
  const [byEmail] = await db
    .select({ n: count(), oldest: min(authAttempts.at) })
    .from(authAttempts)
    .where(and(window, eq(authAttempts.email, email)));
  const [byIp] = await db
    .select({ n: count(), oldest: min(authAttempts.at) })
    .from(authAttempts)
    .where(and(window, eq(authAttempts.ip, ip)));
  const oldest = [byEmail?.oldest, byIp?.oldest]
    .filter((d): d is Date => d instanceof Date)
    .sort((a, b) => a.getTime() - b.getTime())[0];
  return { byEmail: byEmail?.n ?? 0, byIp: byIp?.n ?? 0, oldestAt: oldest ?? null };
}

export async function recordAttempt(db: DbOrTx, kind: AttemptKind, email: string, ip: string, success: boolean) {
  await db.insert(authAttempts).values({ kind, email, ip, success });
}

/** Attempts older than a day no longer count for anything. */
export async function pruneAttempts(db: DbOrTx) {
  await db.delete(authAttempts).where(lt(authAttempts.at, sql`now() - interval '1 day'`));
}

/** Sessions past their idle expiry or their 12-hour absolute lifetime. */
export async function pruneSessions(db: DbOrTx, absoluteHours: number) {
  await db
    .delete(sessions)
    .where(or(lt(sessions.expiresAt, sql`now()`), lt(sessions.createdAt, sql`now() - make_interval(hours => ${absoluteHours})`)));
}

export async function markSignedIn(db: DbOrTx, userId: string, newHash?: string) {
  await db
    .update(users)
    .set({ lastSignInAt: new Date(), ...(newHash ? { passwordHash: newHash } : {}) })
    .where(eq(users.id, userId));
}

export async function setPasswordHash(db: DbOrTx, userId: string, passwordHash: string) {
  const now = new Date();
  await db.update(users).set({ passwordHash, passwordChangedAt: now, updatedAt: now }).where(eq(users.id, userId));
}

export async function insertLinkToken(db: DbOrTx, userId: string, purpose: LinkPurpose, tokenHash: string, expiresAt: Date) {
  await db.insert(oneTimeTokens).values({ userId, purpose, tokenHash, expiresAt });
}

/** Unused links of a user stop working when a newer one is sent or a password is set. */
export async function deleteUnusedLinks(db: DbOrTx, userId: string) {
  await db.delete(oneTimeTokens).where(and(eq(oneTimeTokens.userId, userId), isNull(oneTimeTokens.usedAt)));
}

/** The link and its user; `forUpdate` locks the link row so two redemptions cannot both succeed. */
export async function findLink(db: DbOrTx, tokenHash: string, forUpdate = false) {
  const query = db
    .select({ link: oneTimeTokens, user: users })
    .from(oneTimeTokens)
    .innerJoin(users, eq(users.id, oneTimeTokens.userId))
    .where(eq(oneTimeTokens.tokenHash, tokenHash));
  const [row] = await (forUpdate ? query.for('update', { of: oneTimeTokens }) : query);
  return row;
}

export async function markLinkUsed(db: DbOrTx, linkId: number) {
  await db.update(oneTimeTokens).set({ usedAt: new Date() }).where(eq(oneTimeTokens.id, linkId));
}
