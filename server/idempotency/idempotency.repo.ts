/** Queries on idempotent_requests (the only place that reads or writes it). */
import { and, eq, lt, or, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { idempotentRequests, type IdempotentRequestRow } from './idempotency.schema';

export interface IdempotencyId {
  userId: string;
  key: string;
  route: string;
}

const same = (id: IdempotencyId) =>
  and(eq(idempotentRequests.userId, id.userId), eq(idempotentRequests.key, id.key), eq(idempotentRequests.route, id.route));

/**
 * Marks the request as running; false when the key is already taken. An expired answer,
 * or a request that has been "running" longer than `staleSeconds` (its process died),
 * gives the key up first.
 */
export async function claimKey(
  db: DbOrTx,
  id: IdempotencyId,
  fingerprint: string,
  ttlHours: number,
  staleSeconds: number,
): Promise<boolean> {
  await db
    .delete(idempotentRequests)
    .where(
      and(
        same(id),
        or(
          lt(idempotentRequests.expiresAt, sql`now()`),
          and(
            eq(idempotentRequests.state, 'in_flight'),
            lt(idempotentRequests.createdAt, sql`now() - make_interval(secs => ${staleSeconds})`),
          ),
        ),
      ),
    );
  const inserted = await db
    .insert(idempotentRequests)
    .values({ ...id, fingerprint, state: 'in_flight', expiresAt: sql`now() + make_interval(hours => ${ttlHours})` })
    .onConflictDoNothing()
    .returning({ key: idempotentRequests.key });
  return inserted.length > 0;
}

export async function findKey(db: DbOrTx, id: IdempotencyId): Promise<IdempotentRequestRow | undefined> {
  const [row] = await db.select().from(idempotentRequests).where(same(id));
  return row;
}

export async function storeAnswer(
  db: DbOrTx,
  id: IdempotencyId,
  answer: { status: number; body: unknown; location: string | null },
): Promise<void> {
  await db
    .update(idempotentRequests)
    .set({ state: 'done', responseStatus: answer.status, responseBody: answer.body ?? null, responseLocation: answer.location })
    .where(and(same(id), eq(idempotentRequests.state, 'in_flight')));
}

/** Gives the key back (the request failed), so a retry runs again. */
export async function releaseKey(db: DbOrTx, id: IdempotencyId): Promise<void> {
  await db.delete(idempotentRequests).where(and(same(id), eq(idempotentRequests.state, 'in_flight')));
}

export async function pruneExpiredKeys(db: DbOrTx): Promise<void> {
  await db.delete(idempotentRequests).where(lt(idempotentRequests.expiresAt, sql`now()`));
}
