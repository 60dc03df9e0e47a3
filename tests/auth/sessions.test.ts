/**
 * Session lifetime: idle timeout 30 minutes, absolute lifetime 12 hours (ASVS 4.0.3 3.3.2,
 * L2); sign-out, password change and disabling an account end sessions on the server
 * (ASVS 5.0 7.4.1-7.4.3). Time passes by moving the session's timestamps in the database.
 */
import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { sessions } from '../../server/auth/auth.schema';
import { sessionPolicy } from '../../server/auth/session';
import { createTestApp } from '../support/test-app';
import { createUser, signInAs } from '../support/auth';

const app = createTestApp();
const minutes = (n: number) => n * 60_000;

async function sessionOf(userId: string) {
  const rows = await getDb().select().from(sessions).where(eq(sessions.userId, userId));
  expect(rows).toHaveLength(1);
  return rows[0]!;
}

describe('session lifetime', () => {
  it('uses an idle timeout of 30 minutes and an absolute lifetime of 12 hours', async () => {
    expect(sessionPolicy).toEqual({ idleMinutes: 30, absoluteHours: 12 });
    const agent = await signInAs(app, 'viewer');
    const s = await sessionOf(agent.user.id);
    // [D] a fresh session expires one idle period after it was created.
    expect(s.expiresAt.getTime() - s.createdAt.getTime()).toBeGreaterThan(minutes(29.9));
    expect(s.expiresAt.getTime() - s.createdAt.getTime()).toBeLessThanOrEqual(minutes(30) + 1000);
  });

  it('ends a session left idle past its expiry and clears the cookie', async () => {
    const agent = await signInAs(app, 'viewer');
    await getDb()
      .update(sessions)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(sessions.userId, agent.user.id));
    const response = await agent.get('/api/auth/me');
    expect(response.status).toBe(401);
    expect(String(response.headers['set-cookie'])).toMatch(/slackwater_session=;/);
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id))).toEqual([]);
  });

  it('extends an active session once less than half of the idle period is left, and refreshes the cookie', async () => {
    const agent = await signInAs(app, 'viewer');
    const soon = new Date(Date.now() + minutes(10));
    await getDb().update(sessions).set({ expiresAt: soon }).where(eq(sessions.userId, agent.user.id));
    const response = await agent.get('/api/auth/me');
    expect(response.status).toBe(200);
    expect(String(response.headers['set-cookie'])).toMatch(/slackwater_session=[a-z0-9]+;.*Max-Age=1800/);
    const s = await sessionOf(agent.user.id);
    expect(s.expiresAt.getTime()).toBeGreaterThan(Date.now() + minutes(29));
  });

  it('counts the idle period from the last request: a session 5 minutes from its expiry is slid back to 30', async () => {
    // [S] ASVS 4.0.3 3.3.2: the idle timeout runs from the last activity, not from the last renewal.
    const agent = await signInAs(app, 'viewer');
    await getDb()
      .update(sessions)
      .set({ expiresAt: new Date(Date.now() + minutes(25)) })
      .where(eq(sessions.userId, agent.user.id));
    const response = await agent.get('/api/auth/me');
    expect(response.status).toBe(200);
    expect(String(response.headers['set-cookie'])).toMatch(/slackwater_session=[a-z0-9]+;.*Max-Age=1800/);
    expect((await sessionOf(agent.user.id)).expiresAt.getTime()).toBeGreaterThan(Date.now() + minutes(29));
  });

  it('does not write on every request: a session slid within the last minute is left as it is', async () => {
    const agent = await signInAs(app, 'viewer');
    const before = await sessionOf(agent.user.id);
    const response = await agent.get('/api/auth/me');
    expect(response.status).toBe(200);
    expect(response.headers['set-cookie']).toBeUndefined();
    expect((await sessionOf(agent.user.id)).expiresAt.getTime()).toBe(before.expiresAt.getTime());
  });

  it('ends a session 12 hours after sign-in however active it was', async () => {
    const agent = await signInAs(app, 'planner');
    await getDb()
      .update(sessions)
      .set({ createdAt: new Date(Date.now() - minutes(12 * 60) - 1000), expiresAt: new Date(Date.now() + minutes(25)) })
      .where(eq(sessions.userId, agent.user.id));
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id))).toEqual([]);
  });

  it('keeps a session 11 h 59 min old that is still active', async () => {
    const agent = await signInAs(app, 'planner');
    await getDb()
      .update(sessions)
      .set({ createdAt: new Date(Date.now() - minutes(12 * 60 - 1)) })
      .where(eq(sessions.userId, agent.user.id));
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });
});

describe('ending sessions', () => {
  it('a password change ends every other session of the user and gives this browser a new one', async () => {
    const user = await createUser('planner');
    const laptop = await signInAs(app, user);
    const phone = await signInAs(app, user);
    const before = (await getDb().select().from(sessions).where(eq(sessions.userId, user.id))).map((s) => s.id);
    expect(before).toHaveLength(2);

    const changed = await laptop
      .post('/api/auth/password')
      .send({ currentPassword: user.password, newPassword: 'breakwater lantern seventeen' });
    expect(changed.status).toBe(204);
    expect((await phone.get('/api/auth/me')).status).toBe(401);
    expect((await laptop.get('/api/auth/me')).status).toBe(200);
    const after = (await getDb().select().from(sessions).where(eq(sessions.userId, user.id))).map((s) => s.id);
    expect(after).toHaveLength(1);
    expect(before).not.toContain(after[0]);
  });

  it('a wrong current password changes nothing and says which field is wrong', async () => {
    const agent = await signInAs(app, 'viewer');
    const response = await agent
      .post('/api/auth/password')
      .send({ currentPassword: 'not my password', newPassword: 'breakwater lantern seventeen' });
    expect(response.status).toBe(422);
    expect(response.body.issues).toEqual([{ path: 'currentPassword', message: 'The current password is wrong.' }]);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });

  it('disabling an account ends its sessions at once (ASVS 5.0 7.4.2)', async () => {
    const admin = await signInAs(app, 'admin');
    const victim = await signInAs(app, 'planner');
    const response = await admin.patch(`/api/users/${victim.user.id}`).send({ disabled: true });
    expect(response.status).toBe(200);
    expect(response.body.status).toBe('disabled');
    expect((await victim.get('/api/auth/me')).status).toBe(401);
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, victim.user.id))).toEqual([]);
  });

  it('a role change applies to the next request of a signed-in user', async () => {
    const admin = await signInAs(app, 'admin');
    const user = await signInAs(app, 'viewer');
    expect((await user.get('/api/users')).status).toBe(403);
    await admin.patch(`/api/users/${user.user.id}`).send({ role: 'admin' }).expect(200);
    expect((await user.get('/api/users')).status).toBe(200);
    expect((await user.get('/api/auth/me')).body.role).toBe('admin');
  });
});
