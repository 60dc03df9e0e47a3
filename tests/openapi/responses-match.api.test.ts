/**
 * Real answers against the published description: a walk through every route with the
 * API a pipeline and its colleagues would use (a token for the planner, browser sessions
 * for the others), checking each answer with tests/support/openapi-check.ts, errors
 * included. The plan and study are computed by a real job worker.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request, { type Response } from 'supertest';
import type { Plan, PlanCreated } from '@shared/schemas/plan';
import type { Study, StudyCreated } from '@shared/schemas/study';
import type { JobWorker } from '../../server/jobs/job-worker';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { bearer, createToken } from '../support/tokens';
import { expectMatchesOpenApi } from '../support/openapi-check';
import {
  createPlace,
  dailyPrices,
  startTestWorker,
  stopTestWorker,
  useOwnJobQueues,
  waitUntilFinished,
  type Place,
} from '../support/jobs';
import { sample } from '../profiles/support';
import { HOUR_MS, uniqueName } from '../support/api-fixtures';

useOwnJobQueues('openapi_walk');
const app = createTestApp();
const nothing = '00000000-0000-4000-8000-000000000000';
let worker: JobWorker | null = null;
let planner: SignedInAgent;
let approver: SignedInAgent;
let admin: SignedInAgent;
let viewer: SignedInAgent;
let pipeline: ReturnType<typeof bearer>;
let place: Place;

/** Checks the answer against the document and hands it on. */
async function checked(pending: PromiseLike<Response>, status: number): Promise<Response> {
  const response = await pending;
  expect(response.status, JSON.stringify(response.body).slice(0, 500)).toBe(status);
  expectMatchesOpenApi(response);
  return response;
}

const start = Date.parse('2026-03-02T00:00:00Z');
const iso = (ms: number) => new Date(ms).toISOString();

beforeAll(async () => {
  worker = await startTestWorker();
  [planner, approver, admin, viewer] = await Promise.all([
    signInAs(app, 'planner'),
    signInAs(app, 'approver'),
    signInAs(app, 'admin'),
    signInAs(app, 'viewer'),
  ]);
  pipeline = bearer(app, (await createToken(planner, 'walk')).token);
  place = await createPlace(planner, {
    prices: { values: dailyPrices(4), startMs: start, stepMinutes: 60 },
    battery: { maxCyclesPerDay: null },
  });
});
afterAll(async () => stopTestWorker(worker));

describe('answers of the API match its OpenAPI document', () => {
  it('for health, sign-in, users and errors', async () => {
    await checked(request(app).get('/api/health'), 200);
    await checked(pipeline.get('/api/auth/me'), 200);
    await checked(admin.get('/api/users'), 200);
    const invited = await checked(
      admin
        .post('/api/users')
        .send({ email: `${uniqueName('inv').replace(' ', '-')}@test.slackwater.example`, name: 'Invitee', role: 'viewer' }),
      201,
    );
    await checked(admin.patch(`/api/users/${invited.body.user.id}`).send({ name: 'Invitee Renamed' }), 200);
    await checked(admin.post(`/api/users/${invited.body.user.id}/invitations`), 202);
    await checked(
      request(app)
        .post('/api/auth/password-reset')
        .set('Origin', 'http://localhost:3999')
        .send({ email: 'nobody@test.slackwater.example' }),
      202,
    );
    await checked(request(app).get('/api/sites'), 401);
    await checked(request(app).get('/api/sites').set('Authorization', 'Bearer swt_bad'), 401);
    await checked(viewer.post('/api/sites').send({}), 403);
    await checked(planner.post('/api/sites').send({}), 422);
    await checked(planner.get(`/api/sites/${nothing}`), 404);
  });

  it('for sites, batteries and profiles', async () => {
    const site = await checked(
      pipeline.post('/api/sites').send({ name: uniqueName('Walk site'), timezone: 'Europe/Berlin' }),
      201,
    );
    await checked(pipeline.get('/api/sites'), 200);
    await checked(pipeline.get(`/api/sites/${site.body.id}`), 200);
    await checked(pipeline.patch(`/api/sites/${site.body.id}`).send({ defaultHorizonHours: 48 }), 200);
    const battery = await checked(
      pipeline
        .post(`/api/sites/${site.body.id}/batteries`)
        .send({ name: 'Walk unit', energyKwh: 4000, socMinPct: 0, socMaxPct: 100 }),
      201,
    );
    expect(battery.body.warnings.length).toBeGreaterThan(0);
    await checked(pipeline.get(`/api/sites/${site.body.id}/batteries`), 200);
    await checked(pipeline.get(`/api/batteries/${battery.body.id}`), 200);
    await checked(
      pipeline.patch(`/api/batteries/${battery.body.id}`).send({ version: battery.body.version, name: 'Walk unit 1' }),
      200,
    );
    await checked(
      pipeline.patch(`/api/batteries/${battery.body.id}`).send({ version: battery.body.version, name: 'stale' }),
      409,
    );
    const push = () =>
      pipeline
        .post(`/api/sites/${site.body.id}/profiles`)
        .field('kind', 'price')
        .field('unit', 'currency/MWh')
        .attach('file', sample('prices-week-2026-05-04-15min.csv'), 'week.csv');
    const profile = await checked(push(), 201);
    await checked(push(), 200);
    const bad = pipeline
      .post(`/api/sites/${site.body.id}/profiles`)
      .field('kind', 'price')
      .field('unit', 'currency/MWh')
      .attach('file', Buffer.from('time,price\nnot a time,1\n'), 'bad.csv');
    await checked(bad, 422);
    await checked(pipeline.get(`/api/sites/${site.body.id}/profiles?kind=price`), 200);
    await checked(
      pipeline.get(`/api/profiles/${profile.body.id}?from=2026-05-05T00:00:00%2B02:00&to=2026-05-06T00:00:00%2B02:00`),
      200,
    );
    await checked(pipeline.get(`/api/profiles/${profile.body.id}/original`), 200);
    await checked(pipeline.delete(`/api/profiles/${profile.body.id}`), 204);
  });

  it('for plans, sign-off, export and the horizon preview', async () => {
    const body = (hours: number) => ({
      batteryId: place.batteryId,
      priceProfileId: place.priceProfileId,
      deliveryStart: iso(start + 24 * HOUR_MS),
      deliveryEnd: iso(start + 48 * HOUR_MS),
      horizonHours: hours,
      terminalRule: 'steady-value',
    });
    const created = (await checked(pipeline.post('/api/plans').set('Idempotency-Key', 'walk-plan-1').send(body(48)), 202))
      .body as PlanCreated;
    await checked(pipeline.post('/api/plans').set('Idempotency-Key', 'walk-plan-1').send(body(48)), 202);
    const plan = await waitUntilFinished<Plan>(planner, `/api/plans/${created.plan.id}`);
    expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
    await checked(pipeline.get(`/api/plans/${plan.id}`), 200);
    await checked(pipeline.get(`/api/plans?batteryId=${place.batteryId}`), 200);
    await checked(
      pipeline.get(`/api/batteries/${place.batteryId}/plan-defaults?deliveryStart=${encodeURIComponent(iso(start))}`),
      200,
    );
    await checked(pipeline.post(`/api/plans/${plan.id}/horizon-preview`).send({ horizonHours: 36 }), 200);
    await checked(pipeline.get(`/api/plans/${plan.id}/export.csv`), 200);
    const submitted = await checked(pipeline.post(`/api/plans/${plan.id}/submit`).send({ version: plan.version }), 200);
    await checked(approver.get('/api/sign-off/pending'), 200);
    await checked(approver.post(`/api/plans/${plan.id}/approve`).send({ version: submitted.body.version - 1 }), 409);
    await checked(
      approver.post(`/api/plans/${plan.id}/approve`).send({ version: submitted.body.version, comment: 'Checked.' }),
      200,
    );
    await checked(viewer.get(`/api/plans/${plan.id}/sign-off`), 200);
    await checked(viewer.get(`/api/plans/${plan.id}/export.csv`), 200);

    const second = (await checked(pipeline.post('/api/plans').send(body(24)), 202)).body as PlanCreated;
    const done = await waitUntilFinished<Plan>(planner, `/api/plans/${second.plan.id}`);
    const sent = await checked(pipeline.post(`/api/plans/${done.id}/submit`).send({ version: done.version }), 200);
    await checked(
      approver.post(`/api/plans/${done.id}/reject`).send({ version: sent.body.version, comment: 'Too short a horizon.' }),
      200,
    );
    await checked(pipeline.post(`/api/plans/${done.id}/copy`).send({}), 201);
  });

  it('for horizon studies and jobs', async () => {
    const created = await checked(
      pipeline.post('/api/studies').send({
        batteryId: place.batteryId,
        priceProfileId: place.priceProfileId,
        start: iso(start),
        end: iso(start + 24 * HOUR_MS),
        horizonsHours: [6, 12],
        replanHours: 6,
        terminalRules: ['free'],
      }),
      202,
    );
    const study = await waitUntilFinished<Study>(planner, `/api/studies/${(created.body as StudyCreated).study.id}`);
    expect(study.status, study.errorMessage ?? '').toBe('completed');
    await checked(pipeline.get(`/api/studies/${study.id}`), 200);
    await checked(pipeline.get(`/api/studies?batteryId=${place.batteryId}`), 200);
    await checked(pipeline.get('/api/jobs?kind=plan'), 200);
  });

  it('for the audit trail, the mail outbox, tokens and service users', async () => {
    await checked(admin.get('/api/audit?limit=20'), 200);
    const mail = await checked(admin.get('/api/mail/outbox?limit=5'), 200);
    if (mail.body.messages[0]) await checked(admin.get(`/api/mail/outbox/${mail.body.messages[0].id}`), 200);
    await checked(admin.get('/api/mail/outbox/999999999'), 404);
    const token = await checked(viewer.post('/api/tokens').send({ name: 'walk viewer' }), 201);
    await checked(viewer.post('/api/tokens').send({ name: 'walk viewer' }), 409);
    await checked(viewer.get('/api/tokens'), 200);
    await checked(viewer.delete(`/api/tokens/${token.body.id}`), 204);
    await checked(pipeline.post('/api/tokens').send({ name: 'minted by a token' }), 403);
    const service = await checked(admin.post('/api/service-users').send({ name: 'Walk pipeline', role: 'planner' }), 201);
    await checked(admin.post(`/api/service-users/${service.body.id}/tokens`).send({ name: 'walk push', expiresInDays: 7 }), 201);
    await checked(admin.get('/api/service-users'), 200);
    await checked(pipeline.get('/api/openapi.json'), 200);
    await checked(request(app).get('/api/sites?access_token=swt_x'), 400);
  });
});
