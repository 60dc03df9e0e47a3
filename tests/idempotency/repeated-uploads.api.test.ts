/**
 * A pipeline that pushes the same file twice (a retry after a lost answer) gets the
 * profile already stored, 200 instead of 201, and no duplicate; a different file, the
 * same bytes read differently (another unit), or under another name, is a new profile.
 * Identity by SHA-256 of the bytes [S] FIPS 180-4; concurrency by PostgreSQL advisory
 * locks [S] PostgreSQL manual, "Advisory Locks".
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { getPool } from '../../server/db/client';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { bearer, createToken } from '../support/tokens';
import { createSite, upload } from '../support/api-fixtures';
import { sample } from '../profiles/support';

const app = createTestApp();
const WEEK = 'prices-week-2026-05-04-15min.csv';
let planner: SignedInAgent;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
});

const profileCount = async (siteId: string) =>
  (await getPool().query<{ n: number }>('select count(*)::int as n from profiles where site_id = $1', [siteId])).rows[0]?.n;

describe('re-sending the same file', () => {
  it('answers 200 with the stored profile and stores nothing new, and says so in the audit trail', async () => {
    const site = await createSite(planner);
    const first = await upload(planner, site.id, sample(WEEK), WEEK);
    expect(first.status).toBe(201);
    // The name comes from the file name when the form gives none, as a retried push sends it.
    const again = await upload(planner, site.id, sample(WEEK), WEEK);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await profileCount(site.id)).toBe(1);
    const audit = await getPool().query('select action from audit_events where entity_id = $1 order by id', [first.body.id]);
    expect(audit.rows.map((r) => r.action)).toEqual(['profile.upload', 'profile.upload_repeated']);
  });

  it('is a new profile for another site, kind, unit, name or other bytes', async () => {
    const site = await createSite(planner);
    const other = await createSite(planner);
    expect((await upload(planner, site.id, sample(WEEK), WEEK)).status).toBe(201);
    expect((await upload(planner, other.id, sample(WEEK), WEEK)).status).toBe(201);
    expect((await upload(planner, site.id, sample(WEEK), WEEK, { unit: 'currency/kWh' })).status).toBe(201);
    expect((await upload(planner, site.id, sample(WEEK), WEEK, { kind: 'load', unit: 'kW' })).status).toBe(201);
    expect((await upload(planner, site.id, sample(WEEK), WEEK, { name: 'Scenario B' })).status).toBe(201);
    const edited = Buffer.concat([sample(WEEK), Buffer.from('\n')]);
    expect((await upload(planner, site.id, edited, WEEK)).status).toBe(201);
    expect(await profileCount(site.id)).toBe(5);
  });

  it('five times at once stores one profile: one 201 and four 200 with the same id', async () => {
    const site = await createSite(planner);
    const { token } = await createToken(planner);
    const client = bearer(app, token);
    const answers = await Promise.all(
      Array.from({ length: 5 }, () =>
        client
          .post(`/api/sites/${site.id}/profiles`)
          .field('kind', 'price')
          .field('unit', 'currency/MWh')
          .attach('file', sample(WEEK), WEEK),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await profileCount(site.id)).toBe(1);
  });
});
