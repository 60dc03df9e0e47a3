import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { auditEvents } from './support';
import { createSite, uniqueName } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let viewer: SignedInAgent;
let approver: SignedInAgent;
let admin: SignedInAgent;

beforeAll(async () => {
  [planner, viewer, approver, admin] = await Promise.all([
    signInAs(app, 'planner'),
    signInAs(app, 'viewer'),
    signInAs(app, 'approver'),
    signInAs(app, 'admin'),
  ]);
});

describe('creating and reading sites', () => {
  it('creates a site with null limits and EUR when only name and time zone are given, and records who did it', async () => {
    const name = uniqueName('Quay');
    const created = await planner.post('/api/sites').send({ name, timezone: 'America/New_York' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      name,
      timezone: 'America/New_York',
      importLimitKw: null,
      exportLimitKw: null,
      demandChargePerKw: null,
      currency: 'EUR',
      defaultHorizonHours: null,
      batteryCount: 0,
      profileCount: 0,
    });
    expect(created.body.createdBy).toBe(planner.user.id);
    const events = await auditEvents(created.body.id);
    expect(events.map((e) => e.action)).toEqual(['site.create']);
    expect(events[0]?.actor_email).toBe(planner.user.email);
  });

  it('lists and reads a site for every role', async () => {
    const site = await createSite(planner);
    for (const agent of [viewer, approver, admin, planner]) {
      const list = await agent.get('/api/sites');
      expect(list.status).toBe(200);
      expect(list.body.map((s: { id: string }) => s.id)).toContain(site.id);
      const one = await agent.get(`/api/sites/${site.id}`);
      expect(one.status).toBe(200);
      expect(one.body.name).toBe(site.name);
    }
  });

  it('answers 404 for an unknown id and for an id that is not a UUID', async () => {
    expect((await viewer.get('/api/sites/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    const malformed = await viewer.get('/api/sites/not-an-id');
    expect(malformed.status).toBe(404);
    expect(malformed.body.error).toMatch(/not-an-id/);
  });
});

describe('site validation', () => {
  it.each([
    ['an unknown time zone', { timezone: 'Mars/Olympus_Mons' }, 'timezone', /IANA time zone/],
    ['a fixed offset instead of a zone', { timezone: '+01:00' }, 'timezone', /IANA time zone/],
    ['a negative import limit', { importLimitKw: -1 }, 'importLimitKw', /cannot be negative/],
    ['a currency that is not an ISO code', { currency: 'euro' }, 'currency', /ISO 4217/],
    ['a fractional horizon', { defaultHorizonHours: 1.5 }, 'defaultHorizonHours', /whole hours/],
    ['a limit sent as text', { exportLimitKw: '100' }, 'exportLimitKw', /export limit in kW/],
  ])('refuses %s with 422 naming the field', async (_what, fields, path, message) => {
    const response = await planner.post('/api/sites').send({ name: uniqueName('Bad'), timezone: 'Europe/Berlin', ...fields });
    expect(response.status).toBe(422);
    const issue = response.body.issues.find((i: { path: string }) => i.path === path);
    expect(issue?.message).toMatch(message);
  });

  it('refuses keys the client may not set (no mass assignment) on create and on edit', async () => {
    // SECURITY.md: no mass assignment (ASVS 5.0 15.3.3).
    const created = await planner.post('/api/sites').send({
      name: uniqueName('Sneaky'),
      timezone: 'UTC',
      id: '00000000-0000-4000-8000-000000000001',
      createdBy: 'someone-else',
    });
    expect(created.status).toBe(422);
    expect(JSON.stringify(created.body.issues)).toMatch(/createdBy|id/);

    const site = await createSite(planner);
    const patched = await planner.patch(`/api/sites/${site.id}`).send({ createdBy: 'someone-else' });
    expect(patched.status).toBe(422);
    const after = await planner.get(`/api/sites/${site.id}`);
    expect(after.body.createdBy).not.toBe('someone-else');
  });

  it('refuses a second site with the same name in another letter case (409)', async () => {
    const site = await createSite(planner);
    const again = await planner.post('/api/sites').send({ name: site.name.toUpperCase(), timezone: 'UTC' });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatch(/already exists/);
  });
});

describe('editing sites', () => {
  it('changes only the fields sent and records each change from → to', async () => {
    const site = await createSite(planner, { importLimitKw: 5000 });
    const response = await planner.patch(`/api/sites/${site.id}`).send({ importLimitKw: 6500, demandChargePerKw: 9.5 });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      importLimitKw: 6500,
      demandChargePerKw: 9.5,
      exportLimitKw: 4000,
      timezone: 'Europe/Berlin',
    });
    const update = (await auditEvents(site.id)).find((e) => e.action === 'site.update');
    expect(update?.details).toEqual({
      changes: { importLimitKw: { from: 5000, to: 6500 }, demandChargePerKw: { from: null, to: 9.5 } },
    });
  });

  it('refuses an empty edit with 422', async () => {
    const site = await createSite(planner);
    expect((await planner.patch(`/api/sites/${site.id}`).send({})).status).toBe(422);
  });
});

describe('who may change sites', () => {
  it('lets planners and admins create and edit, and refuses viewers and approvers with 403', async () => {
    const site = await createSite(admin);
    expect((await admin.patch(`/api/sites/${site.id}`).send({ currency: 'USD' })).status).toBe(200);
    for (const agent of [viewer, approver]) {
      expect((await agent.post('/api/sites').send({ name: uniqueName('No'), timezone: 'UTC' })).status).toBe(403);
      expect((await agent.patch(`/api/sites/${site.id}`).send({ currency: 'GBP' })).status).toBe(403);
    }
    expect((await planner.get(`/api/sites/${site.id}`)).body.currency).toBe('USD');
  });

  it('answers 401 to a request without a session', async () => {
    expect((await request(app).get('/api/sites')).status).toBe(401);
  });
});
