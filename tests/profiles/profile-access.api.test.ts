/**
 * Who may read, upload and delete profiles, and a profile
 * never serving another site (SECURITY.md: object-level checks).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { requireSiteProfile } from '../../server/profiles/profiles.service';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { storedForSite } from '../sites/support';
import { sample } from './support';
import { type CreatedSite, createSite, upload } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let viewer: SignedInAgent;
let approver: SignedInAgent;
let admin: SignedInAgent;
let siteA: CreatedSite;
let siteB: CreatedSite;
let profileB: string;

const WEEK = 'prices-week-2026-05-04-15min.csv';

beforeAll(async () => {
  [planner, viewer, approver, admin] = await Promise.all([
    signInAs(app, 'planner'),
    signInAs(app, 'viewer'),
    signInAs(app, 'approver'),
    signInAs(app, 'admin'),
  ]);
  siteA = await createSite(planner);
  siteB = await createSite(planner);
  const uploaded = await upload(planner, siteB.id, sample(WEEK), WEEK);
  expect(uploaded.status).toBe(201);
  profileB = uploaded.body.id;
});

describe('roles', () => {
  it('refuses uploads and deletes from viewers and approvers (403) and stores nothing', async () => {
    for (const agent of [viewer, approver]) {
      const before = await storedForSite(siteA.id);
      expect((await upload(agent, siteA.id, sample(WEEK), WEEK)).status).toBe(403);
      expect((await agent.delete(`/api/profiles/${profileB}`)).status).toBe(403);
      expect(await storedForSite(siteA.id)).toEqual(before);
    }
    expect((await viewer.get(`/api/profiles/${profileB}`)).status).toBe(200);
  });

  it('lets every role read the list, the detail and the original file', async () => {
    for (const agent of [viewer, approver, admin, planner]) {
      expect((await agent.get(`/api/sites/${siteB.id}/profiles`)).status).toBe(200);
      expect((await agent.get(`/api/profiles/${profileB}`)).status).toBe(200);
      expect((await agent.get(`/api/profiles/${profileB}/original`)).status).toBe(200);
    }
  });

  it('lets an admin upload and delete', async () => {
    const uploaded = await upload(admin, siteA.id, sample(WEEK), WEEK);
    expect(uploaded.status).toBe(201);
    expect((await admin.delete(`/api/profiles/${uploaded.body.id}`)).status).toBe(204);
  });

  it('answers 401 to every profile route without a session', async () => {
    const anonymous = request(app);
    expect((await anonymous.get(`/api/sites/${siteB.id}/profiles`)).status).toBe(401);
    expect((await anonymous.get(`/api/profiles/${profileB}`)).status).toBe(401);
    expect((await anonymous.get(`/api/profiles/${profileB}/original`)).status).toBe(401);
  });
});

describe('profiles of another site', () => {
  it('never lists a profile under a site it was not uploaded to', async () => {
    const listA = await planner.get(`/api/sites/${siteA.id}/profiles`);
    expect(listA.body.map((p: { id: string }) => p.id)).not.toContain(profileB);
    const listB = await planner.get(`/api/sites/${siteB.id}/profiles`);
    expect(listB.body.map((p: { id: string; siteId: string }) => [p.id, p.siteId])).toContainEqual([profileB, siteB.id]);
  });

  it("refuses another site's profile, and one of the wrong kind, where a site's profile is required", async () => {
    await expect(requireSiteProfile(siteA.id, profileB)).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/another site/),
    });
    await expect(requireSiteProfile(siteB.id, profileB, 'load')).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/price profile/),
    });
    await expect(requireSiteProfile(siteB.id, profileB, 'price')).resolves.toMatchObject({ id: profileB });
  });

  it('answers 404 for unknown and malformed profile ids', async () => {
    expect((await viewer.get('/api/profiles/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await viewer.get('/api/profiles/abc/original')).status).toBe(404);
    expect((await planner.delete('/api/profiles/abc')).status).toBe(404);
  });

  it('refuses an unknown kind filter on the list (422)', async () => {
    expect((await viewer.get(`/api/sites/${siteB.id}/profiles`).query({ kind: 'wind' })).status).toBe(422);
  });
});
