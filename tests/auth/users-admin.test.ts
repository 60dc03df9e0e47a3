/** The admin's user management: invite, change role, disable; bad input is refused whole. */
import { describe, expect, it } from 'vitest';
import { and, desc, eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { auditEvents } from '../../server/audit/audit.schema';
import { users } from '../../server/users/users.schema';
import { createTestApp } from '../support/test-app';
import { createUser, signInAs } from '../support/auth';

const app = createTestApp();

async function auditFor(entityId: string) {
  return getDb()
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, 'user'), eq(auditEvents.entityId, entityId)))
    .orderBy(desc(auditEvents.id));
}

describe('GET /api/users', () => {
  it('lists users with their status and never their password hash', async () => {
    const admin = await signInAs(app, 'admin');
    const invited = await createUser('viewer', { invited: true });
    const response = await admin.get('/api/users');
    expect(response.status).toBe(200);
    const found = response.body.users.find((u: { id: string }) => u.id === invited.id);
    expect(found).toMatchObject({ email: invited.email, role: 'viewer', status: 'invited', lastSignInAt: null });
    expect(JSON.stringify(response.body)).not.toMatch(/argon2|passwordHash/);
  });
});

describe('POST /api/users (invite)', () => {
  it('refuses an unknown role, a missing name, an over-long name and extra fields with 422, storing nothing', async () => {
    const admin = await signInAs(app, 'admin');
    const email = `bad-${admin.user.id.slice(0, 8)}@test.slackwater.example`;
    const cases = [
      { email, name: 'Ola', role: 'superuser' },
      { email, role: 'viewer' },
      { email, name: 'x'.repeat(101), role: 'viewer' },
      { email, name: 'Ola', role: 'viewer', disabled: false },
      { email: 'not-an-address', name: 'Ola', role: 'viewer' },
    ];
    for (const body of cases) {
      const response = await admin.post('/api/users').send(body);
      expect(response.status, JSON.stringify(body)).toBe(422);
      expect(response.body.issues.length).toBeGreaterThan(0);
    }
    const roleIssue = (await admin.post('/api/users').send(cases[0])).body.issues[0];
    expect(roleIssue).toMatchObject({ path: 'role', message: expect.stringMatching(/admin, planner, approver, viewer/) });
    expect(await getDb().select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  it('refuses a second user with the same e-mail in any letter case with 409', async () => {
    const admin = await signInAs(app, 'admin');
    const existing = await createUser('viewer');
    const response = await admin.post('/api/users').send({ email: existing.email.toUpperCase(), name: 'Twin', role: 'planner' });
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/already exists/);
  });

  it('records the invitation in the audit trail with who invited whom as which role', async () => {
    const admin = await signInAs(app, 'admin');
    const email = `audited-${admin.user.id.slice(0, 8)}@test.slackwater.example`;
    const { body } = await admin.post('/api/users').send({ email, name: 'Audra', role: 'planner' }).expect(201);
    const [event] = await auditFor(body.user.id);
    expect(event).toMatchObject({ action: 'user.invited', actorId: admin.user.id, details: { email, role: 'planner' } });
  });
});

describe('PATCH /api/users/:id', () => {
  it('changes the role and audits from and to', async () => {
    const admin = await signInAs(app, 'admin');
    const user = await createUser('viewer');
    const response = await admin.patch(`/api/users/${user.id}`).send({ role: 'approver' });
    expect(response.status).toBe(200);
    expect(response.body.role).toBe('approver');
    const [event] = await auditFor(user.id);
    expect(event).toMatchObject({
      action: 'user.role_changed',
      actorEmail: admin.user.email,
      details: { from: 'viewer', to: 'approver' },
    });
  });

  it('refuses an empty patch, an unknown role and unknown fields with 422, changing nothing', async () => {
    const admin = await signInAs(app, 'admin');
    const user = await createUser('viewer');
    for (const body of [
      {},
      { role: 'owner' },
      { passwordHash: 'x' },
      { email: 'new@test.slackwater.example' },
      { disabled: 'yes' },
    ]) {
      expect((await admin.patch(`/api/users/${user.id}`).send(body)).status, JSON.stringify(body)).toBe(422);
    }
    const [row] = await getDb().select().from(users).where(eq(users.id, user.id));
    expect(row).toMatchObject({ role: 'viewer', disabled: false, email: user.email });
  });

  it('answers 404 for an id that names nobody', async () => {
    const admin = await signInAs(app, 'admin');
    expect((await admin.patch('/api/users/00000000-0000-4000-8000-000000000000').send({ role: 'viewer' })).status).toBe(404);
    expect((await admin.patch('/api/users/not-an-id').send({ role: 'viewer' })).status).toBe(404);
  });

  it('re-enables a disabled account, who can then sign in again', async () => {
    const admin = await signInAs(app, 'admin');
    const user = await createUser('planner', { disabled: true });
    const response = await admin.patch(`/api/users/${user.id}`).send({ disabled: false });
    expect(response.body.status).toBe('active');
    await signInAs(app, user);
    expect((await auditFor(user.id)).map((e) => e.action)).toContain('user.enabled');
  });
});
