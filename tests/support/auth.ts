/**
 * Sign-in helpers for API tests. Every user gets a unique e-mail, so test files running
 * in parallel against the same database never collide.
 *
 *   const app = createTestApp();
 *   const planner = await signInAs(app, 'planner');        // supertest agent, cookie kept
 *   await planner.post('/api/sites').send({...});           // Origin: testOrigin is sent for you
 *   planner.user.id                                         // the user behind the agent
 *   const viewer = await createUser('viewer', { name: 'Vera' });
 */
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import type { App } from 'supertest/types';
import { and, desc, gt, ilike } from 'drizzle-orm';
import type { Role } from '@shared/schemas/auth';
import { getDb, initDb } from '../../server/db/client';
import { users } from '../../server/users/users.schema';
import { mailOutbox } from '../../server/mail/mail.schema';
import { hashPassword } from '../../server/auth/password-hash';
import { testDatabaseUrl } from './database-url';
import { testOrigin } from './test-app';

/** The password of every user made by `createUser` unless overridden. */
export const testPassword = 'tidal-basin-ledger-47';

export interface TestUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  password: string;
}

export interface CreateUserOverrides {
  email?: string;
  name?: string;
  password?: string;
  disabled?: boolean;
  /** Create an invited user who has not set a password yet. */
  invited?: boolean;
}

let testHash: Promise<string> | null = null;

/** Inserts a user straight into the test database (no e-mail, no audit row). */
export async function createUser(role: Role = 'planner', overrides: CreateUserOverrides = {}): Promise<TestUser> {
  initDb(testDatabaseUrl(), 5);
  const id = randomUUID();
  const email = (overrides.email ?? `${role}-${id.slice(0, 8)}@test.slackwater.example`).toLowerCase();
  const password = overrides.password ?? testPassword;
  testHash ??= hashPassword(testPassword);
  const passwordHash = overrides.invited ? null : password === testPassword ? await testHash : await hashPassword(password);
  const name = overrides.name ?? `Test ${role} ${id.slice(0, 4)}`;
  await getDb()
    .insert(users)
    .values({ id, email, name, role, passwordHash, disabled: overrides.disabled ?? false });
  return { id, email, name, role, password };
}

/** A supertest agent that keeps cookies and sends `Origin: testOrigin` on every request. */
export function anonymousAgent(app: App): TestAgent {
  return request.agent(app).set('Origin', testOrigin);
}

export type SignedInAgent = TestAgent & { user: TestUser };

/** Signs in a new user of `role` (or the given user) and returns the agent holding the session. */
export async function signInAs(app: App, who: Role | TestUser): Promise<SignedInAgent> {
  const user = typeof who === 'string' ? await createUser(who) : who;
  const agent = anonymousAgent(app);
  const response = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
  if (response.status !== 200) {
    throw new Error(`signInAs(${user.role}) failed with ${response.status}: ${JSON.stringify(response.body)}`);
  }
  return Object.assign(agent, { user });
}

export interface CapturedMail {
  id: number;
  to: string;
  subject: string;
  text: string;
  html: string | null;
}

/**
 * The newest message the fake SMTP server stored for `to` (after `sinceId`), waiting up
 * to `timeoutMs` for mail that is sent after the response (e.g. password reset).
 */
export async function waitForMail(to: string, options: { sinceId?: number; timeoutMs?: number } = {}): Promise<CapturedMail> {
  initDb(testDatabaseUrl(), 5);
  const deadline = Date.now() + (options.timeoutMs ?? 5000);
  for (;;) {
    const [row] = await getDb()
      .select()
      .from(mailOutbox)
      .where(and(ilike(mailOutbox.to, `%${to.replace(/[\\%_]/g, (c) => `\\${c}`)}%`), gt(mailOutbox.id, options.sinceId ?? 0)))
      .orderBy(desc(mailOutbox.id))
      .limit(1);
    if (row) return { id: row.id, to: row.to, subject: row.subject, text: row.text, html: row.html };
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} arrived at the fake SMTP server.`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
