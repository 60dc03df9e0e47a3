/**
 * Requests made with a token: `Authorization: Bearer` (RFC 6750 section 2.1), no Origin
 * needed because no cookie is read (OWASP CSRF Prevention Cheat Sheet: CSRF rides on
 * credentials the browser attaches by itself), one 401 for every unusable token
 * (RFC 6750 section 3.1 `invalid_token`), tokens in URLs refused (RFC 6750 section 5.3),
 * and the token's user's current role deciding (ASVS 5.0 8.2.1).
 */
import { describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { logger } from '../../server/logger';
import { createTestApp, testOrigin } from '../support/test-app';
import { anonymousAgent, signInAs } from '../support/auth';
import { bearer, createToken, expireToken, secretOf } from '../support/tokens';
import { uniqueName } from '../support/api-fixtures';

const app = createTestApp();

const siteBody = () => ({ name: uniqueName('Token site'), timezone: 'Europe/Berlin', currency: 'EUR' });

describe('a token request', () => {
  it('changes data without an Origin header, while a cookie request without one is still refused', async () => {
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    const withToken = await bearer(app, token).post('/api/sites').send(siteBody());
    expect(withToken.status, JSON.stringify(withToken.body)).toBe(201);
    const cookie = planner.get('/api/auth/me');
    expect((await cookie).status).toBe(200);
    // The same session cookie, without the agent's Origin header: CSRF defence still applies.
    const session = (
      await anonymousAgent(app).post('/api/auth/sign-in').send({ email: planner.user.email, password: planner.user.password })
    ).headers['set-cookie'] as unknown as string[];
    const noOrigin = await request(app).post('/api/sites').set('Cookie', session).send(siteBody());
    expect(noOrigin.status).toBe(403);
    const crossSite = await request(app)
      .post('/api/sites')
      .set('Cookie', session)
      .set('Origin', 'https://evil.example')
      .send(siteBody());
    expect(crossSite.status).toBe(403);
  });

  it('is authenticated by the token alone: a session cookie beside it is ignored', async () => {
    const admin = await signInAs(app, 'admin');
    const viewer = await signInAs(app, 'viewer');
    const { token } = await createToken(viewer);
    const me = await admin.get('/api/auth/me').set('Authorization', `Bearer ${token}`);
    expect(me.body.id).toBe(viewer.user.id);
    const write = await admin.post('/api/sites').set('Authorization', `Bearer ${token}`).send(siteBody());
    expect(write.status).toBe(403);
  });

  it('of a viewer is refused on writes (403) and allowed to read', async () => {
    const viewer = await signInAs(app, 'viewer');
    const planner = await signInAs(app, 'planner');
    const site = (await planner.post('/api/sites').send(siteBody())).body as { id: string };
    const { token } = await createToken(viewer);
    const client = bearer(app, token);
    expect((await client.get('/api/sites')).status).toBe(200);
    expect((await client.post('/api/sites').send(siteBody())).status).toBe(403);
    expect((await client.patch(`/api/sites/${site.id}`).send({ name: 'x' })).status).toBe(403);
    const upload = await client
      .post(`/api/sites/${site.id}/profiles`)
      .field('kind', 'price')
      .field('unit', 'EUR/MWh')
      .attach('file', Buffer.from('time,price\n'), 'p.csv');
    expect(upload.status).toBe(403);
    expect((await client.post('/api/plans').send({})).status).toBe(403);
  });

  it("acts with the user's current role: a demotion applies to the next request", async () => {
    const admin = await signInAs(app, 'admin');
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    expect((await bearer(app, token).post('/api/sites').send(siteBody())).status).toBe(201);
    expect((await admin.patch(`/api/users/${planner.user.id}`).send({ role: 'viewer' })).status).toBe(200);
    expect((await bearer(app, token).post('/api/sites').send(siteBody())).status).toBe(403);
  });

  it('cannot create tokens or change the password: those need a browser session', async () => {
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    const mint = await bearer(app, token).post('/api/tokens').send({ name: 'offspring' });
    expect(mint.status).toBe(403);
    expect(mint.body.error).toMatch(/signed-in browser session/);
    const password = await bearer(app, token)
      .post('/api/auth/password')
      .send({ currentPassword: planner.user.password, newPassword: 'another-long-password-42' });
    expect(password.status).toBe(403);
    expect((await bearer(app, token).get('/api/tokens')).status).toBe(200);
  });
});

describe('an unusable token', () => {
  it('answers the same 401 body whether it is expired, revoked, malformed or unknown', async () => {
    const planner = await signInAs(app, 'planner');
    const expired = await createToken(planner, 'expired');
    await expireToken(expired.id);
    const revoked = await createToken(planner, 'revoked');
    await planner.delete(`/api/tokens/${revoked.id}`);
    const valid = await createToken(planner, 'valid');
    const wrongSecret = `${valid.token.slice(0, 37)}${'A'.repeat(43)}`;
    const unknown = `swt_${'0'.repeat(32)}_${secretOf(valid.token)}`;
    const presented = [expired.token, revoked.token, 'swt_short', 'not a token at all', wrongSecret, unknown];
    const answers = await Promise.all(presented.map((t) => request(app).get('/api/sites').set('Authorization', `Bearer ${t}`)));
    const basic = await request(app).get('/api/sites').set('Authorization', 'Basic dXNlcjpwYXNz');
    const empty = await request(app).get('/api/sites').set('Authorization', 'Bearer ');
    for (const response of [...answers, basic, empty]) {
      expect(response.status).toBe(401);
      expect(response.body).toEqual(answers[0]?.body);
      expect(response.headers['www-authenticate']).toBe('Bearer realm="Slackwater API", error="invalid_token"');
    }
    expect(answers[0]?.body.error).toMatch(/mistyped, expired or revoked/);
    // A public route is no way around it: a bad token is refused wherever it is sent.
    expect((await request(app).get('/api/health').set('Authorization', `Bearer ${revoked.token}`)).status).toBe(401);
    expect((await bearer(app, valid.token).get('/api/sites')).status).toBe(200);
  });

  it('in the URL is refused (400), whether or not an Authorization header comes too', async () => {
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    for (const url of [
      `/api/sites?access_token=${token}`,
      `/api/sites?token=${token}`,
      `/api/sites?q=${token}`,
      `/api/sites?API_KEY=x`,
    ]) {
      const response = await request(app).get(url);
      expect(response.status, url).toBe(400);
      expect(response.body.error).toMatch(/Authorization header/);
    }
    const both = await bearer(app, token).get(`/api/sites?access_token=${token}`);
    expect(both.status).toBe(400);
  });
});

describe('what a token request leaves behind', () => {
  it('audits every action "via token <name>" with the token id, and never the secret', async () => {
    const planner = await signInAs(app, 'planner');
    const admin = await signInAs(app, 'admin');
    const created = await createToken(planner, 'audited push');
    const site = await bearer(app, created.token).post('/api/sites').send(siteBody());
    expect(site.status).toBe(201);
    const refused = await bearer(app, created.token).get('/api/audit');
    expect(refused.status).toBe(403);
    const trail = await admin.get(`/api/audit?entityId=${site.body.id}`);
    const [event] = trail.body.events;
    expect(event).toMatchObject({
      action: 'site.create',
      actorId: planner.user.id,
      via: 'token audited push',
      viaTokenId: created.id,
    });
    const denied = await admin.get(`/api/audit?action=access.denied&actor=${planner.user.email}`);
    expect(denied.body.events[0]).toMatchObject({ via: 'token audited push', viaTokenId: created.id });
    const everything = await admin.get(`/api/audit?actor=${planner.user.email}&limit=500`);
    expect(JSON.stringify(everything.body)).not.toContain(secretOf(created.token));
    // A browser-session action carries no "via".
    const bySession = await planner.post('/api/sites').send(siteBody());
    const sessionEvent = (await admin.get(`/api/audit?entityId=${bySession.body.id}`)).body.events[0];
    expect(sessionEvent.via).toBeNull();
  });

  it('writes no token into the logs, on success or refusal', async () => {
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    const lines: string[] = [];
    const capture = (...args: unknown[]) => void lines.push(args.map(String).join(' '));
    const log = vi.spyOn(console, 'log').mockImplementation(capture);
    const error = vi.spyOn(console, 'error').mockImplementation(capture);
    logger.setLevel('debug');
    try {
      await bearer(app, token).get('/api/sites');
      await bearer(app, token).get('/api/audit');
      await request(app).get('/api/sites').set('Authorization', `Bearer ${token}x`);
      await request(app).get(`/api/sites?access_token=${token}`);
      await request(app)
        .post('/api/sites')
        .set('Authorization', `Bearer ${token}`)
        .set('Origin', testOrigin)
        .send({ name: token });
    } finally {
      logger.setLevel('error');
      log.mockRestore();
      error.mockRestore();
    }
    expect(lines.length).toBeGreaterThan(0);
    expect(lines.join('\n')).not.toContain(secretOf(token));
  });
});

describe('disabling a user', () => {
  it('revokes their tokens for good: enabling the account again does not revive them', async () => {
    const admin = await signInAs(app, 'admin');
    const planner = await signInAs(app, 'planner');
    const { token } = await createToken(planner);
    expect((await admin.patch(`/api/users/${planner.user.id}`).send({ disabled: true })).status).toBe(200);
    expect((await bearer(app, token).get('/api/sites')).status).toBe(401);
    expect((await admin.patch(`/api/users/${planner.user.id}`).send({ disabled: false })).status).toBe(200);
    expect((await bearer(app, token).get('/api/sites')).status).toBe(401);
    const trail = await admin.get(`/api/audit?action=user.tokens_revoked&entityId=${planner.user.id}`);
    expect(trail.body.events).toHaveLength(1);
  });
});
