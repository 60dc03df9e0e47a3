/** `GET /api/audit`: who did what, when and from where (ASVS 5.0 16.2.1), readable by admins only. */
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { createUser, signInAs } from '../support/auth';
import { recordAudit } from '../../server/audit/audit.service';
import { getDb } from '../../server/db/client';

const app = createTestApp();

describe('GET /api/audit', () => {
  it('shows sign-in, failed sign-in, sign-out and refused requests, filtered by actor and action prefix', async () => {
    const admin = await signInAs(app, 'admin');
    const viewer = await signInAs(app, 'viewer');
    await viewer.get('/api/users').expect(403);
    await admin.post('/api/auth/sign-in').send({ email: viewer.user.email, password: 'wrong but long enough' }).expect(401);
    await viewer.post('/api/auth/sign-out').expect(204);

    const response = await admin.get('/api/audit').query({ actor: viewer.user.email });
    expect(response.status).toBe(200);
    const actions = response.body.events.map((e: { action: string }) => e.action);
    expect(actions).toEqual(['auth.sign_out', 'auth.sign_in_failed', 'access.denied', 'auth.sign_in']);
    const denied = response.body.events.find((e: { action: string }) => e.action === 'access.denied');
    expect(denied).toMatchObject({ actorId: viewer.user.id, details: { method: 'GET', path: '/api/users' } });
    expect(denied.ip).toMatch(/127\.0\.0\.1/);
    expect(new Date(denied.at).toISOString()).toBe(denied.at); // UTC instant

    const onlyAuth = await admin.get('/api/audit').query({ actor: viewer.user.email, action: 'auth.' });
    expect(onlyAuth.body.events.map((e: { action: string }) => e.action)).toEqual([
      'auth.sign_out',
      'auth.sign_in_failed',
      'auth.sign_in',
    ]);
    // Passwords never reach the trail.
    expect(JSON.stringify(response.body)).not.toMatch(/wrong but long enough/);
  });

  it('pages newest first with nextBefore, and filters by entity and time', async () => {
    const admin = await signInAs(app, 'admin');
    const subject = await createUser('viewer');
    for (let i = 0; i < 3; i++) {
      await recordAudit(
        getDb(),
        { actorId: admin.user.id, actorEmail: admin.user.email },
        { action: 'test.paging', entityType: 'user', entityId: subject.id, details: { i } },
      );
    }
    const first = await admin.get('/api/audit').query({ entityId: subject.id, limit: 2 });
    expect(first.body.events.map((e: { details: { i: number } }) => e.details.i)).toEqual([2, 1]);
    expect(first.body.nextBefore).toBe(first.body.events[1].id);
    const second = await admin.get('/api/audit').query({ entityId: subject.id, limit: 2, before: first.body.nextBefore });
    expect(second.body.events.map((e: { details: { i: number } }) => e.details.i)).toEqual([0]);
    expect(second.body.nextBefore).toBeNull();
    const future = await admin.get('/api/audit').query({ entityId: subject.id, from: '2999-01-01' });
    expect(future.body.events).toEqual([]);
  });

  it('refuses bad filters with 422 naming the parameter', async () => {
    const admin = await signInAs(app, 'admin');
    const bad = await admin.get('/api/audit').query({ from: 'yesterday' });
    expect(bad.status).toBe(422);
    expect(bad.body.issues[0]).toMatchObject({ path: 'from' });
    expect((await admin.get('/api/audit').query({ limit: 100000 })).status).toBe(422);
    expect((await admin.get('/api/audit').query({ colour: 'red' })).status).toBe(422);
  });

  it('treats % and _ in the actor filter as plain characters', async () => {
    const admin = await signInAs(app, 'admin');
    const response = await admin.get('/api/audit').query({ actor: '%' });
    expect(response.status).toBe(200);
    expect(response.body.events).toEqual([]);
  });
});
