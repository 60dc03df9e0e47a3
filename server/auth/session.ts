/**
 * Sessions, behind one small interface so lucia v3 (deprecated upstream) can be swapped
 * without touching callers. Idle timeout 30 minutes from the last request (lucia alone
 * extends a session only once half its lifetime is gone, which would end a session
 * read quietly for 16 minutes after a request 14 minutes in; we slide it at most once a
 * minute instead), absolute lifetime 12 hours from `created_at` (ASVS 4.0.3 3.3.2, L2).
 */
import { eq } from 'drizzle-orm';
import { Lucia, TimeSpan } from 'lucia';
import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import type { AuthUser, Role } from '@shared/schemas/auth';
import { getDb, type Db } from '../db/client';
import { users, type UserRow } from '../users/users.schema';
import { sessions } from './auth.schema';

export const sessionPolicy = { idleMinutes: 30, absoluteHours: 12 } as const;

interface UserAttributes {
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
}
type SlackwaterLucia = Lucia<{ createdAt: Date }, UserAttributes>;

declare module 'lucia' {
  interface Register {
    Lucia: SlackwaterLucia;
    DatabaseUserAttributes: Omit<UserRow, 'id'>;
    DatabaseSessionAttributes: { createdAt: Date };
  }
}

export interface SessionOptions {
  /** True when the app is served over HTTPS: Secure cookie with the `__Host-` prefix (ASVS 5.0 3.3.1-3.3.4). */
  secure: boolean;
}

export interface ValidSession {
  user: AuthUser;
  sessionId: string;
  /** A Set-Cookie value when the session was renewed and the browser's cookie must be refreshed. */
  refreshedCookie: string | null;
}

export interface SessionStore {
  readonly cookieName: string;
  readCookie(cookieHeader: string | undefined): string | null;
  create(userId: string): Promise<{ sessionId: string; cookie: string }>;
  validate(sessionId: string): Promise<ValidSession | null>;
  invalidate(sessionId: string): Promise<void>;
  invalidateUser(userId: string): Promise<void>;
  blankCookie(): string;
}

function buildLucia(db: Db, options: SessionOptions): SlackwaterLucia {
  const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(sessionPolicy.idleMinutes, 'm'),
    sessionCookie: {
      name: options.secure ? '__Host-slackwater_session' : 'slackwater_session',
      attributes: { secure: options.secure, sameSite: 'lax', path: '/' },
    },
    getSessionAttributes: (a) => ({ createdAt: a.createdAt }),
    getUserAttributes: (a) => ({ email: a.email, name: a.name, role: a.role, disabled: a.disabled }),
  });
}

const absoluteMs = sessionPolicy.absoluteHours * 3600_000;
const idleMs = sessionPolicy.idleMinutes * 60_000;
/** How stale the expiry may get before a request slides it: one write a minute per active user at most. */
const slideStepMs = 60_000;
const cache = new Map<string, { db: Db; store: SessionStore }>();

/** The session store for this process's database and the app's scheme. */
export function sessionStore(options: SessionOptions): SessionStore {
  const db = getDb();
  const key = String(options.secure);
  const hit = cache.get(key);
  if (hit && hit.db === db) return hit.store;
  const lucia = buildLucia(db, options);
  const store: SessionStore = {
    cookieName: lucia.sessionCookieName,
    readCookie: (header) => (header ? lucia.readSessionCookie(header) : null),
    async create(userId) {
      const session = await lucia.createSession(userId, { createdAt: new Date() });
      return { sessionId: session.id, cookie: lucia.createSessionCookie(session.id).serialize() };
    },
    async validate(sessionId) {
      const { session, user } = await lucia.validateSession(sessionId);
      if (!session) return null;
      if (user.disabled) {
        await lucia.invalidateUserSessions(user.id);
        return null;
      }
      if (Date.now() - session.createdAt.getTime() >= absoluteMs) {
        await lucia.invalidateSession(session.id);
        return null;
      }
      let refreshed = session.fresh;
      if (!refreshed && session.expiresAt.getTime() < Date.now() + idleMs - slideStepMs) {
        await db
          .update(sessions)
          .set({ expiresAt: new Date(Date.now() + idleMs) })
          .where(eq(sessions.id, session.id));
        refreshed = true;
      }
      return {
        user: { id: user.id, email: user.email, name: user.name, role: user.role },
        sessionId: session.id,
        refreshedCookie: refreshed ? lucia.createSessionCookie(session.id).serialize() : null,
      };
    },
    invalidate: (sessionId) => lucia.invalidateSession(sessionId),
    invalidateUser: (userId) => lucia.invalidateUserSessions(userId),
    blankCookie: () => lucia.createBlankSessionCookie().serialize(),
  };
  cache.set(key, { db, store });
  return store;
}

/** Ends every session of a user, e.g. when the account is disabled (cookie options play no part). */
export function endUserSessions(userId: string): Promise<void> {
  return sessionStore({ secure: false }).invalidateUser(userId);
}
