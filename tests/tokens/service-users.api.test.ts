/**
 * Service users: an admin gives one a name and a role; it has no password, cannot sign
 * in or be sent a link, and acts only through the tokens an admin makes for it
 * (ASVS 5.0 8.2.1: deny by default; the role decides as for people).
 */
import { describe, expect, it } from 'vitest';
import { getDb, getPool } from '../../server/db/client';
import { lockActiveAdmins } from '../../server/users/users.repo';
import { createTestApp } from '../support/test-app';
import { anonymousAgent, signInAs } from '../support/auth';
import { bearer } from '../support/tokens';
import { uniqueName } from '../support/api-fixtures';

const app = createTestApp();

async function makeServiceUser(admin: Awaited<ReturnType<typeof signInAs>>, role = 'planner') {
  const response = await admin.post('/api/service-users').send({ name: uniqueName('Forecast pipeline'), role });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body as { id: string; name: string; email: string; role: string };
}

describe('service users', () => {
  it('are created by an admin with a role, an unmailable address and no password', async () => {
    const admin = await signInAs(app, 'admin');
    const service = await makeServiceUser(admin);
    expect(service.email).toMatch(/^forecast-pipeline-[0-9a-f]+-[0-9a-f]{6}@service-users\.invalid$/);
    const row = await getPool().query('select kind, password_hash from users where id = $1', [service.id]);
    expect(row.rows[0]).toEqual({ kind: 'service', password_hash: null });
    // People and service users are listed apart.
    expect((await admin.get('/api/users')).body.users.map((u: { id: string }) => u.id)).not.toContain(service.id);
    const listed = (await admin.get('/api/service-users')).body as { id: string; tokens: unknown[] }[];
    expect(listed.find((s) => s.id === service.id)).toMatchObject({ role: 'planner', disabled: false, tokens: [] });
  });

  it('act through a token an admin creates, audited under their own name via the token', async () => {
    const admin = await signInAs(app, 'admin');
    const service = await makeServiceUser(admin);
    const created = await admin.post(`/api/service-users/${service.id}/tokens`).send({ name: 'push', expiresInDays: 30 });
    expect(created.status).toBe(201);
    const client = bearer(app, created.body.token);
    expect((await client.get('/api/auth/me')).body).toMatchObject({ id: service.id, role: 'planner' });
    const site = await client.post('/api/sites').send({ name: uniqueName('Pipeline site'), timezone: 'UTC', currency: 'EUR' });
    expect(site.status).toBe(201);
    const [event] = (await admin.get(`/api/audit?entityId=${site.body.id}`)).body.events;
    expect(event).toMatchObject({ actorId: service.id, actorEmail: service.email, via: 'token push' });
    const listed = (await admin.get('/api/service-users')).body as { id: string; tokens: { id: string }[] }[];
    expect(listed.find((s) => s.id === service.id)?.tokens.map((t) => t.id)).toEqual([created.body.id]);
  });

  it('cannot sign in, get a reset link or an invitation', async () => {
    const admin = await signInAs(app, 'admin');
    const service = await makeServiceUser(admin);
    const signIn = await anonymousAgent(app)
      .post('/api/auth/sign-in')
      .send({ email: service.email, password: 'anything-at-all-1' });
    expect(signIn.status).toBe(401);
    expect((await anonymousAgent(app).post('/api/auth/password-reset').send({ email: service.email })).status).toBe(202);
    const links = await getPool().query('select count(*)::int as n from one_time_tokens where user_id = $1', [service.id]);
    expect(links.rows[0].n).toBe(0);
    expect((await admin.post(`/api/users/${service.id}/invitations`)).status).toBe(409);
    // And the database refuses a password for a service user outright.
    await expect(getPool().query("update users set password_hash = 'x' where id = $1", [service.id])).rejects.toThrow(
      /users_service_has_no_password/,
    );
  });

  it('are for admins only, and tokens for people go through /api/tokens', async () => {
    const planner = await signInAs(app, 'planner');
    const admin = await signInAs(app, 'admin');
    expect((await planner.post('/api/service-users').send({ name: 'Sneaky', role: 'admin' })).status).toBe(403);
    expect((await planner.get('/api/service-users')).status).toBe(403);
    const person = await admin.post(`/api/service-users/${planner.user.id}/tokens`).send({ name: 'not for people' });
    expect(person.status).toBe(404);
    expect((await admin.post('/api/service-users').send({ name: 'x', role: 'owner' })).status).toBe(422);
  });

  it('lose their tokens when disabled, and get none while disabled', async () => {
    const admin = await signInAs(app, 'admin');
    const service = await makeServiceUser(admin, 'viewer');
    const created = await admin.post(`/api/service-users/${service.id}/tokens`).send({ name: 'reader' });
    expect((await bearer(app, created.body.token).get('/api/sites')).status).toBe(200);
    expect((await admin.patch(`/api/users/${service.id}`).send({ disabled: true })).status).toBe(200);
    expect((await bearer(app, created.body.token).get('/api/sites')).status).toBe(401);
    expect((await admin.post(`/api/service-users/${service.id}/tokens`).send({ name: 'again' })).status).toBe(409);
  });

  it('with the admin role do not count as an admin who could manage users (last-admin rule)', async () => {
    const admin = await signInAs(app, 'admin');
    const service = await makeServiceUser(admin, 'admin');
    const counted = await getDb().transaction((tx) => lockActiveAdmins(tx));
    expect(counted).toContain(admin.user.id);
    expect(counted).not.toContain(service.id);
  });
});
