/**
 * Invitation and reset links: e-mailed through the fake SMTP server, valid once, expiring
 * (ASVS 5.0 6.4.1-6.4.2: reset links are random, single use and short-lived).
 */
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { oneTimeTokens, sessions } from '../../server/auth/auth.schema';
import { users } from '../../server/users/users.schema';
import { createTestApp, testOrigin } from '../support/test-app';
import { anonymousAgent, createUser, signInAs, waitForMail } from '../support/auth';

const app = createTestApp();
const post = (path: string) => request(app).post(path).set('Origin', testOrigin);

/** The token from the link in an e-mail's text (`.../set-password#token=...`). */
function tokenFrom(text: string): string {
  const match = /\/set-password#token=([A-Za-z0-9_-]+)/.exec(text);
  if (!match?.[1]) throw new Error(`No password link in:\n${text}`);
  return match[1];
}

describe('an invitation', () => {
  it('arrives at the fake SMTP server with a link that sets the password once, then the invitee signs in', async () => {
    const admin = await signInAs(app, 'admin');
    const email = `invitee-${admin.user.id.slice(0, 8)}@test.slackwater.example`;
    const invite = await admin.post('/api/users').send({ email, name: 'Ines Invitee', role: 'approver' });
    expect(invite.status).toBe(201);
    expect(invite.body).toMatchObject({ mail: 'sent', user: { email, role: 'approver', status: 'invited' } });

    const mail = await waitForMail(email);
    expect(mail.subject).toBe('Your invitation to Slackwater');
    expect(mail.text).toContain(`${testOrigin}/set-password#token=`);
    const token = tokenFrom(mail.text);
    // Only a hash of the token is stored.
    const stored = await getDb().select().from(oneTimeTokens).where(eq(oneTimeTokens.userId, invite.body.user.id));
    expect(stored.map((t) => t.tokenHash)).not.toContain(token);

    const check = await post('/api/auth/password-links/check').send({ token });
    expect(check.status).toBe(200);
    expect(check.body).toMatchObject({ purpose: 'invite', email, name: 'Ines Invitee' });

    const weak = await post('/api/auth/password-links/redeem').send({ token, password: 'password1234' });
    expect(weak.status).toBe(422);
    expect(weak.body.issues[0]).toMatchObject({ path: 'password' });

    const set = await post('/api/auth/password-links/redeem').send({ token, password: 'low tide over the mudflats' });
    expect(set.status).toBe(204);
    const again = await post('/api/auth/password-links/redeem').send({ token, password: 'another calm harbour day' });
    expect(again.status).toBe(410);
    expect(again.body.error).toMatch(/already used/);
    expect((await post('/api/auth/password-links/check').send({ token })).status).toBe(410);

    const signIn = await post('/api/auth/sign-in').send({ email, password: 'low tide over the mudflats' });
    expect(signIn.status).toBe(200);
    expect(signIn.body.role).toBe('approver');
  });

  it('cannot be redeemed after it expires (410), and a fresh invitation replaces the old link', async () => {
    const admin = await signInAs(app, 'admin');
    const email = `late-${admin.user.id.slice(0, 8)}@test.slackwater.example`;
    const invite = await admin.post('/api/users').send({ email, name: 'Lars Late', role: 'viewer' });
    const first = tokenFrom((await waitForMail(email)).text);
    await getDb()
      .update(oneTimeTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(oneTimeTokens.userId, invite.body.user.id));
    const expired = await post('/api/auth/password-links/redeem').send({ token: first, password: 'low tide over the mudflats' });
    expect(expired.status).toBe(410);
    expect(expired.body.error).toMatch(/expired/);
    const [row] = await getDb().select().from(users).where(eq(users.id, invite.body.user.id));
    expect(row?.passwordHash).toBeNull(); // nothing stored

    const sinceId = (await waitForMail(email)).id;
    expect((await admin.post(`/api/users/${invite.body.user.id}/invitations`)).status).toBe(202);
    const second = tokenFrom((await waitForMail(email, { sinceId })).text);
    expect(second).not.toBe(first);
    expect(
      (await post('/api/auth/password-links/redeem').send({ token: first, password: 'low tide over the mudflats' })).status,
    ).toBe(400);
    expect(
      (await post('/api/auth/password-links/redeem').send({ token: second, password: 'low tide over the mudflats' })).status,
    ).toBe(204);
  });

  it('answers a made-up or truncated token with a clear 4xx', async () => {
    const unknown = await post('/api/auth/password-links/check').send({ token: 'x'.repeat(43) });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error).toMatch(/not valid/);
    const truncated = await post('/api/auth/password-links/check').send({ token: 'abc' });
    expect(truncated.status).toBe(422);
    expect(truncated.body.issues[0].message).toMatch(/incomplete/);
  });
});

describe('"forgot password"', () => {
  it('e-mails a reset link that works once and ends every session of the account (ASVS 5.0 7.4.3)', async () => {
    const agent = await signInAs(app, 'planner');
    const { email } = agent.user;
    const requested = await post('/api/auth/password-reset').send({ email: email.toUpperCase() });
    expect(requested.status).toBe(202);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe('Reset your Slackwater password');
    const token = tokenFrom(mail.text);
    expect((await post('/api/auth/password-links/check').send({ token })).body.purpose).toBe('reset');

    expect((await post('/api/auth/password-links/redeem').send({ token, password: 'spring tide beacon nine' })).status).toBe(204);
    expect(await getDb().select().from(sessions).where(eq(sessions.userId, agent.user.id))).toEqual([]);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect((await post('/api/auth/sign-in').send({ email, password: agent.user.password })).status).toBe(401);
    expect((await post('/api/auth/sign-in').send({ email, password: 'spring tide beacon nine' })).status).toBe(200);
    expect((await post('/api/auth/password-links/redeem').send({ token, password: 'yet another tide table' })).status).toBe(410);
  });

  it('answers an unknown or disabled address exactly like a known one, and sends nothing', async () => {
    const disabled = await createUser('viewer', { disabled: true });
    const known = await createUser('viewer');
    const unknownEmail = `ghost-${known.id.slice(0, 8)}@test.slackwater.example`;
    const a = await post('/api/auth/password-reset').send({ email: unknownEmail });
    const b = await post('/api/auth/password-reset').send({ email: disabled.email });
    const c = await post('/api/auth/password-reset').send({ email: known.email });
    expect([a.status, b.status, c.status]).toEqual([202, 202, 202]);
    expect(a.body).toEqual(c.body);
    expect(b.body).toEqual(c.body);
    await waitForMail(known.email); // the known address got its link...
    await expect(waitForMail(disabled.email, { timeoutMs: 500 })).rejects.toThrow(/No e-mail/); // ...the others none
    await expect(waitForMail(unknownEmail, { timeoutMs: 200 })).rejects.toThrow(/No e-mail/);
  });

  it('rejects a request without a valid e-mail with 422', async () => {
    const response = await anonymousAgent(app).post('/api/auth/password-reset').send({ email: 'not-an-address' });
    expect(response.status).toBe(422);
    expect(response.body.issues[0]).toMatchObject({ path: 'email' });
  });
});
