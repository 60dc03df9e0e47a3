/**
 * CSRF: state-changing requests must carry our Origin (ASVS 5.0 3.5.1-3.5.3; OWASP CSRF
 * Prevention Cheat Sheet, "verifying origin with standard headers").
 */
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { sessions } from '../../server/auth/auth.schema';
import { createTestApp, testOrigin } from '../support/test-app';
import { createUser, signInAs, testPassword } from '../support/auth';

const app = createTestApp();

describe('the Origin check', () => {
  it('refuses a cross-origin sign-in with 403 and creates no session', async () => {
    const user = await createUser('planner');
    const response = await request(app)
      .post('/api/auth/sign-in')
      .set('Origin', 'https://evil.example')
      .send({ email: user.email, password: testPassword });
    expect(response.status).toBe(403);
    expect(response.body.error).toMatch(/must come from http:\/\/localhost:3999/);
    expect(response.headers['set-cookie']).toBeUndefined();
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, user.id))).toEqual([]);
  });

  it('refuses a cross-origin POST that carries a valid session cookie, so the session survives', async () => {
    const agent = await signInAs(app, 'admin');
    const forged = await agent.post('/api/auth/sign-out').set('Origin', 'http://localhost:3998');
    expect(forged.status).toBe(403);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const forgedInvite = await agent
      .post('/api/users')
      .set('Origin', 'null')
      .send({ email: `csrf-${agent.user.id}@test.slackwater.example`, name: 'Forged', role: 'admin' });
    expect(forgedInvite.status).toBe(403);
  });

  it('refuses a state-changing request with neither Origin nor Referer', async () => {
    const user = await createUser('viewer');
    const response = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: testPassword });
    expect(response.status).toBe(403);
    expect(response.body.error).toMatch(/Origin header/);
  });

  it('falls back to the Referer when a browser sends no Origin', async () => {
    const user = await createUser('viewer');
    const same = await request(app)
      .post('/api/auth/sign-in')
      .set('Referer', `${testOrigin}/sign-in`)
      .send({ email: user.email, password: testPassword });
    expect(same.status).toBe(200);
    const other = await request(app)
      .post('/api/auth/sign-in')
      .set('Referer', 'https://evil.example/page')
      .send({ email: user.email, password: testPassword });
    expect(other.status).toBe(403);
  });

  it('does not let a GET change state: sign-out answers only POST (ASVS 5.0 3.5.3)', async () => {
    const agent = await signInAs(app, 'viewer');
    const viaGet = await agent.get('/api/auth/sign-out');
    expect(viaGet.status).toBe(404);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });
});
