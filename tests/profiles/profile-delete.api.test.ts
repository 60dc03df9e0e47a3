/**
 * Deleting a profile: allowed while no plan rests on it, refused with the
 * reason (409) while a submitted or approved plan does, and refused
 * while a draft plan refers to it (the plans table's foreign key).
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getPool } from '../../server/db/client';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { auditEvents } from '../sites/support';
import { sample } from './support';
import { type CreatedSite, createSite, upload } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let site: CreatedSite;
let batteryId: string;
const planIds: string[] = [];

const WEEK = 'prices-week-2026-05-04-15min.csv';

let copies = 0;

/**
 * A new profile of the week's prices. Each call sends a distinct file (one more trailing
 * blank line, which the reader skips): the same bytes again would be answered with the
 * profile already stored, not a new one.
 */
async function uploadWeek(): Promise<string> {
  copies += 1;
  const bytes = Buffer.concat([sample(WEEK), Buffer.from('\n'.repeat(copies))]);
  const response = await upload(planner, site.id, bytes, WEEK);
  expect(response.status).toBe(201);
  return response.body.id as string;
}

/** A minimal plan row in the plans module's table, as its service would leave it after create (and submit). */
async function insertPlan(status: 'draft' | 'submitted', priceProfileId: string, loadProfileId: string | null = null) {
  const id = randomUUID();
  await getPool().query(
    `insert into plans (id, site_id, battery_id, price_profile_id, load_profile_id, delivery_start, delivery_end,
       horizon_hours, terminal_rule, initial_soc_pct, inputs, status, created_by, submitted_by, submitted_at)
     values ($1, $2, $3, $4, $5, '2026-05-05T00:00:00+02:00', '2026-05-06T00:00:00+02:00', 24, 'free', 50, '{}'::jsonb, $6, 'test', $7, $8)`,
    [
      id,
      site.id,
      batteryId,
      priceProfileId,
      loadProfileId,
      status,
      status === 'submitted' ? 'test' : null,
      status === 'submitted' ? new Date() : null,
    ],
  );
  planIds.push(id);
  return id;
}

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  site = await createSite(planner);
  const battery = await planner.post(`/api/sites/${site.id}/batteries`).send({ name: 'For plans', energyKwh: 4000 });
  batteryId = battery.body.id;
});

afterAll(async () => {
  // Draft and submitted plans may be deleted (only signed-off ones are frozen).
  await getPool().query('delete from plans where id = any($1::uuid[])', [planIds]);
});

describe('deleting profiles', () => {
  it('deletes an unused profile (204), which then is gone, and records who deleted it', async () => {
    const id = await uploadWeek();
    expect((await planner.delete(`/api/profiles/${id}`)).status).toBe(204);
    expect((await planner.get(`/api/profiles/${id}`)).status).toBe(404);
    expect((await auditEvents(id)).map((e) => e.action)).toEqual(['profile.upload', 'profile.delete']);
  });

  it('refuses while a submitted plan uses it as its price profile, naming the plan and its status', async () => {
    const id = await uploadWeek();
    const planId = await insertPlan('submitted', id);
    const response = await planner.delete(`/api/profiles/${id}`);
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/submitted or approved/);
    expect(response.body.plans).toEqual([{ id: planId, status: 'submitted' }]);
    expect((await planner.get(`/api/profiles/${id}`)).status).toBe(200);
  });

  it('refuses while a submitted plan uses it as its load profile', async () => {
    const price = await uploadWeek();
    const load = await upload(planner, site.id, sample('site-load-week-2026-05-04-15min.csv'), 'load.csv', {
      kind: 'load',
      unit: 'kW',
    });
    await insertPlan('submitted', price, load.body.id);
    expect((await planner.delete(`/api/profiles/${load.body.id}`)).status).toBe(409);
  });

  it('refuses while a draft plan refers to it, and allows it once the plan is gone', async () => {
    const id = await uploadWeek();
    const planId = await insertPlan('draft', id);
    const refused = await planner.delete(`/api/profiles/${id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/while a plan refers to it/);
    await getPool().query('delete from plans where id = $1', [planId]);
    expect((await planner.delete(`/api/profiles/${id}`)).status).toBe(204);
  });
});
