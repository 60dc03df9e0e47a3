import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { and, desc, eq } from 'drizzle-orm';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { getDb } from '../../server/db/client';
import { auditEvents } from '../../server/audit/audit.schema';
import { sessions } from '../../server/auth/auth.schema';
import { createTestApp, testOrigin } from '../support/test-app';
import { anonymousAgent, createUser, signInAs, testPassword } from '../support/auth';
import { testDatabaseUrl } from '../support/database-url';

const app = createTestApp();
const post = (path: string) => request(app).post(path).set('Origin', testOrigin);

async function lastAudit(action: string, actorEmail: string) {
  const [row] = await getDb()
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.action, action), eq(auditEvents.actorEmail, actorEmail)))
    .orderBy(desc(auditEvents.id))
    .limit(1);
  return row;
}

describe('POST /api/auth/sign-in', () => {
  it('signs a user in with the right password and answers their id, e-mail, name and role', async () => {
    const user = await createUser('approver');
    const response = await post('/api/auth/sign-in').send({ email: user.email.toUpperCase(), password: testPassword });
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ id: user.id, email: user.email, name: user.name, role: 'approver' });
    // ASVS 5.0 16.3.1: successful authentication is logged.
    expect(await lastAudit('auth.sign_in', user.email)).toMatchObject({ actorId: user.id, entityId: user.id });
  });

  it('answers an unknown e-mail and a wrong password with the same 401 and body (ASVS 5.0 6.3.8)', async () => {
    const user = await createUser('planner');
    const wrongPassword = await post('/api/auth/sign-in').send({ email: user.email, password: 'not-the-password-at-all' });
    const unknownEmail = await post('/api/auth/sign-in').send({
      email: `nobody-${user.id}@test.slackwater.example`,
      password: testPassword,
    });
    expect(wrongPassword.status).toBe(401);
    expect(unknownEmail.status).toBe(401);
    expect(unknownEmail.body).toEqual(wrongPassword.body);
    expect(wrongPassword.headers['set-cookie']).toBeUndefined();
    // ASVS 5.0 16.3.1: failed attempts are logged, with the reason kept for admins only.
    expect((await lastAudit('auth.sign_in_failed', user.email))?.details).toEqual({ reason: 'wrong password' });
  });

  it('refuses a disabled account and an invited user without a password with the same 401', async () => {
    const disabled = await createUser('viewer', { disabled: true });
    const invited = await createUser('viewer', { invited: true });
    const a = await post('/api/auth/sign-in').send({ email: disabled.email, password: testPassword });
    const b = await post('/api/auth/sign-in').send({ email: invited.email, password: testPassword });
    expect([a.status, b.status]).toEqual([401, 401]);
    expect(a.body).toEqual(b.body);
  });

  it('rejects malformed JSON with 400 and missing or over-long fields with 422 naming the field', async () => {
    const malformed = await post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": "a@b.c", ');
    expect(malformed.status).toBe(400);
    expect(malformed.body).toEqual({ error: 'The request body is not valid JSON.' });

    const missing = await post('/api/auth/sign-in').send({ email: 'someone@test.slackwater.example' });
    expect(missing.status).toBe(422);
    expect(missing.body.issues).toContainEqual(expect.objectContaining({ path: 'password' }));

    const longEmail = await post('/api/auth/sign-in').send({
      email: `${'x'.repeat(300)}@test.slackwater.example`,
      password: 'x',
    });
    expect(longEmail.status).toBe(422);
    expect(longEmail.body.issues[0].path).toBe('email');
    expect(JSON.stringify(longEmail.body)).not.toMatch(/at .*\.ts:\d+/); // no stack trace

    const extra = await post('/api/auth/sign-in').send({ email: 'a@test.slackwater.example', password: 'x', role: 'admin' });
    expect(extra.status).toBe(422);
  });

  it('starts a new session on every sign-in and ends the one the browser carried (ASVS 5.0 7.2.4)', async () => {
    const agent = await signInAs(app, 'planner');
    const before = await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id));
    expect(before).toHaveLength(1);
    await agent.post('/api/auth/sign-in').send({ email: agent.user.email, password: agent.user.password }).expect(200);
    const after = await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id));
    expect(after).toHaveLength(1);
    expect(after[0]?.id).not.toBe(before[0]?.id);
  });
});

describe('the session cookie', () => {
  it('is HttpOnly, SameSite=Lax, path / and not Secure over plain HTTP (ASVS 5.0 3.3.1-3.3.4)', async () => {
    const user = await createUser('viewer');
    const response = await post('/api/auth/sign-in').send({ email: user.email, password: testPassword });
    const cookie = String(response.headers['set-cookie']);
    expect(cookie).toMatch(/^slackwater_session=[a-z0-9]+;/);
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).toMatch(/; Path=\//);
    expect(cookie).not.toMatch(/; Secure/i);
    expect(cookie).not.toMatch(/; Domain=/i);
  });

  it('is Secure with the __Host- prefix when the app is served over HTTPS (ASVS 5.0 3.3.1, 3.3.3)', async () => {
    const origin = 'https://slackwater.test';
    const httpsApp = createApp(
      loadConfig({ NODE_ENV: 'test', DATABASE_URL: testDatabaseUrl(), APP_ORIGIN: origin, LOG_LEVEL: 'error' }),
    );
    const user = await createUser('viewer');
    const response = await request(httpsApp)
      .post('/api/auth/sign-in')
      .set('Origin', origin)
      .send({ email: user.email, password: testPassword });
    expect(response.status).toBe(200);
    const cookie = String(response.headers['set-cookie']);
    expect(cookie).toMatch(/^__Host-slackwater_session=[a-z0-9]+;/);
    expect(cookie).toMatch(/; Secure/i);
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).not.toMatch(/; Domain=/i);
  });
});

describe('GET /api/auth/me and POST /api/auth/sign-out', () => {
  it('answers the signed-in user, and 401 once they signed out; the session is gone from the database', async () => {
    const agent = await signInAs(app, 'viewer');
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ id: agent.user.id, role: 'viewer' });

    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/slackwater_session=;.*Max-Age=0/);
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id))).toEqual([]);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect(await lastAudit('auth.sign_out', agent.user.email)).toBeDefined();
  });

  it('answers 401 to an anonymous caller and to a forged session cookie', async () => {
    expect((await request(app).get('/api/auth/me')).status).toBe(401);
    const forged = await request(app)
      .get('/api/auth/me')
      .set('Cookie', 'slackwater_session=aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa');
    expect(forged.status).toBe(401);
  });

  it('lets anyone sign out twice without an error (idempotent)', async () => {
    const agent = anonymousAgent(app);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
  });
});
