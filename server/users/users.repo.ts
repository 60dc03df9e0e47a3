/** Queries on the users table. */
import { and, asc, eq, inArray, ne, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { users, type UserRow } from './users.schema';

export type NewUser = typeof users.$inferInsert;
export type UserPatch = Partial<Pick<UserRow, 'name' | 'role' | 'disabled'>>;

export async function findUserByEmail(db: DbOrTx, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email.toLowerCase()));
  return row;
}

export async function findUserById(db: DbOrTx, id: string, forUpdate = false): Promise<UserRow | undefined> {
  const query = db.select().from(users).where(eq(users.id, id));
  const [row] = await (forUpdate ? query.for('update') : query);
  return row;
}

/** People, not service users (those are listed with their tokens, server/tokens). */
export async function listUsers(db: DbOrTx): Promise<UserRow[]> {
  return db.select().from(users).where(eq(users.kind, 'person')).orderBy(asc(users.email));
}

export async function listServiceUsers(db: DbOrTx): Promise<UserRow[]> {
  return db.select().from(users).where(eq(users.kind, 'service')).orderBy(asc(users.name));
}

/** Inserts a user; returns undefined when the e-mail is already taken. */
export async function insertUser(db: DbOrTx, user: NewUser): Promise<UserRow | undefined> {
  const [row] = await db.insert(users).values(user).onConflictDoNothing({ target: users.email }).returning();
  return row;
}

export async function updateUser(db: DbOrTx, id: string, patch: UserPatch): Promise<UserRow | undefined> {
  const [row] = await db
    .update(users)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(users.id, id))
    .returning();
  return row;
}

/**
 * Locks every active admin row, always in id order so two transactions cannot deadlock.
 * Two admins demoting each other at once then queue here, and the second sees the
 * first's change, so the last admin cannot disappear in a race. Service users do not
 * count: they cannot sign in to manage users.
 */
export async function lockActiveAdmins(tx: DbOrTx): Promise<string[]> {
  const rows = await tx
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.role, 'admin'), eq(users.disabled, false), eq(users.kind, 'person')))
    .orderBy(asc(users.id))
    .for('update');
  return rows.map((r) => r.id);
}

export interface Person {
  id: string;
  name: string;
  email: string;
  role: string;
  disabled: boolean;
}

/** Names and addresses of the given users (for sign-off history, e-mails and exports). */
export async function findPeople(db: DbOrTx, ids: readonly string[]): Promise<Map<string, Person>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await db
    .select({ id: users.id, name: users.name, email: users.email, role: users.role, disabled: users.disabled })
    .from(users)
    .where(inArray(users.id, unique));
  return new Map(rows.map((r) => [r.id, r]));
}

/** Who may sign off a plan: active approvers and admins with a password set, never the submitter. */
export function listSignOffRecipients(db: DbOrTx, submitterId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(
      and(
        inArray(users.role, ['approver', 'admin']),
        eq(users.disabled, false),
        sql`${users.passwordHash} is not null`,
        ne(users.id, submitterId),
      ),
    )
    .orderBy(asc(users.email));
}
