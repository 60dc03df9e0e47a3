/**
 * `GET /api/plans/:id/export.csv` against the real database: RFC 4180 bytes,
 * one row per delivery interval, the file name and headers, who may export
 * what, formula-injection guards on user-written text, the checksum verified
 * before serving, and the round trip back through the real upload endpoint.
 * Files are read back with papaparse, independent of the writer.
 */
import Papa from 'papaparse';
import pg from 'pg';
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { createUser, signInAs, type SignedInAgent } from '../support/auth';
import { testDatabaseUrl } from '../support/database-url';
import { createPlace, insertDraftPlan, type Place } from '../sign-off/support';
import { HOUR_MS, sqlRows } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let approver: SignedInAgent;
let viewer: SignedInAgent;
let place: Place;

beforeAll(async () => {
  const approverUser = await createUser('approver', { name: '@Ada Approver' });
  [planner, approver, viewer] = await Promise.all([
    signInAs(app, 'planner'),
    signInAs(app, approverUser),
    signInAs(app, 'viewer'),
  ]);
  place = await createPlace(planner);
});

async function approvedPlan(
  comment = 'Fine.',
  o: Parameters<typeof insertDraftPlan>[2] = {},
): Promise<{ id: string; checksum: string }> {
  const plan = await insertDraftPlan(place, planner.user.id, o);
  expect((await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(200);
  const response = await approver.post(`/api/plans/${plan.id}/approve`).send({ version: 2, comment });
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return { id: plan.id, checksum: response.body.checksum as string };
}

/** The body as text, whatever supertest thinks of text/csv. */
const download = (agent: SignedInAgent, id: string) =>
  agent
    .get(`/api/plans/${id}/export.csv`)
    .buffer(true)
    .parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => done(null, text));
    });

const rowsOf = (text: string) =>
  Papa.parse<Record<string, string>>(text, { header: true, newline: '\r\n', skipEmptyLines: true }).data;

describe('exporting an approved plan', () => {
  let plan: { id: string; checksum: string };
  let text: string;
  let response: Awaited<ReturnType<typeof download>>;

  beforeAll(async () => {
    plan = await approvedPlan("=cmd|' /C calc'!A0");
    response = await download(viewer, plan.id);
    text = response.body as string;
  });

  it('answers a viewer with RFC 4180 CSV: text/csv with a header row, CRLF line ends', () => {
    expect(response.status).toBe(200);
    // [S: RFC 4180 section 3] media type text/csv, optional header parameter.
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8; header=present');
    // [S: RFC 4180 section 2.1] CRLF between records: no bare LF outside quoted fields here.
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.replace(/\r\n/g, '').includes('\n')).toBe(false);
  });

  it('has one row per interval of the 24-hour delivery window, without the lookahead', () => {
    const rows = rowsOf(text);
    // [D] 2026-03-29 is the spring DST day in Berlin, but the window is 24 one-hour intervals from 00:00+01:00.
    expect(rows).toHaveLength(24);
    expect(rows[0]?.interval_start).toBe('2026-03-29T00:00:00+01:00');
    expect(rows[23]?.interval_end).toBe('2026-03-30T01:00:00+02:00');
    expect(rows.map((r) => Number(r.price_eur_per_mwh))).toEqual(place.prices.slice(0, 24));
  });

  it('names the file after site, window, plan and status in under 100 characters, and sends the checksum in a header', () => {
    const disposition = response.headers['content-disposition'] as string;
    const slug = place.siteName
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '');
    // [D] 24 one-hour intervals from 00:00+01:00 on the spring DST day; the plan id's first 8 characters.
    const fileName = `slackwater_${slug}_2026-03-29T0000+0100_24h_plan-${plan.id.slice(0, 8)}_approved.csv`;
    expect(disposition).toBe(`attachment; filename="${fileName}"`);
    expect(fileName.length).toBeLessThan(100);
    expect(response.headers['x-slackwater-checksum']).toBe(`sha256=${plan.checksum}`);
    expect(response.headers['x-slackwater-plan-status']).toBe('approved');
    expect(response.headers['x-slackwater-plan-id']).toBe(plan.id);
  });

  it("states the approval time with the site's offset and the plan's facts on the first row", async () => {
    const [first] = rowsOf(text);
    const stored = await sqlRows<{ approved_at: Date; battery_id: string }>(
      'select approved_at, battery_id from plans where id = $1',
      [plan.id],
    );
    const approvedAt = first?.approved_at ?? '';
    // [D] the same instant as stored, written with Berlin's offset at that time (+01:00 or +02:00), like the intervals.
    expect(Date.parse(approvedAt)).toBe(Math.floor(stored[0]!.approved_at.getTime() / 1000) * 1000);
    expect(approvedAt).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\+0[12]:00$/);
    expect(first).toMatchObject({ battery: 'Unit 1', delivery_start: '2026-03-29T00:00:00+01:00', plan_id: plan.id });
    expect(first?.interval_start_utc).toBe('2026-03-28T23:00:00Z');
  });

  it('guards user-written text against formula injection while numbers stay numbers', () => {
    const [first, second] = rowsOf(text);
    // [S: OWASP CSV Injection; ASVS 5.0.0 1.2.10] = and @ starts get a leading single quote.
    expect(first?.site).toBe(`'${place.siteName}`);
    expect(first?.approved_by).toBe("'@Ada Approver");
    expect(first?.approval_comment).toBe(`'=cmd|' /C calc'!A0`);
    expect(first?.checksum_sha256).toBe(plan.checksum);
    // A negative price and a negative net power are numbers, not guarded text.
    const negative = rowsOf(text).find((r) => Number(r.price_eur_per_mwh) < 0);
    expect(negative?.price_eur_per_mwh).toMatch(/^-\d/);
    expect(second?.notice).toBe('');
  });

  it('carries the cautions in the file itself', () => {
    const notice = rowsOf(text)[0]?.notice ?? '';
    expect(notice).toMatch(/interconnection agreement/);
    expect(notice).toMatch(/grid code/);
    expect(notice).toMatch(/battery maker's operating limits/);
    expect(notice).toMatch(/fire and safety/);
    expect(notice).toMatch(/qualified personnel decide dispatch/);
  });

  it('is recorded in the audit trail', async () => {
    const events = await sqlRows<{ action: string; actor_id: string }>(
      "select action, actor_id from audit_events where entity_id = $1 and action = 'plan.exported'",
      [plan.id],
    );
    expect(events.map((e) => e.actor_id)).toContain(viewer.user.id);
  });
});

describe('the round trip', () => {
  it('uploads back, unedited, as a price profile through the real upload endpoint', async () => {
    const plan = await approvedPlan();
    const exported = await download(planner, plan.id);
    const fileName = /filename="([^"]+)"/.exec(exported.headers['content-disposition'] as string)?.[1] ?? 'export.csv';
    const upload = await planner
      .post(`/api/sites/${place.siteId}/profiles`)
      .field('kind', 'price')
      .field('unit', 'currency/MWh')
      .attach('file', Buffer.from(exported.body as string, 'utf8'), fileName);
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    const profile = await planner.get(`/api/profiles/${upload.body.id}`);
    expect(profile.body).toMatchObject({
      stepMinutes: 60,
      valueCount: 24,
      start: '2026-03-28T23:00:00.000Z',
      originalFilename: fileName,
    });
    // [D] the prices the test uploaded at the start, window hours 0-23, come back exactly.
    expect(profile.body.values).toEqual(place.prices.slice(0, 24));
    expect(profile.body.notes.join(' ')).toMatch(/"interval_start".*"price_eur_per_mwh"/);
  });
});

describe('who may export what', () => {
  it('gives a planner a draft, clearly marked as not approved and without a checksum', async () => {
    const draft = await insertDraftPlan(place, planner.user.id);
    const response = await download(planner, draft.id);
    expect(response.status).toBe(200);
    expect(response.headers['content-disposition']).toMatch(/_draft-NOT-APPROVED\.csv"$/);
    expect(response.headers['x-slackwater-plan-status']).toBe('draft');
    expect(response.headers['x-slackwater-checksum']).toBeUndefined();
    const rows = rowsOf(response.body as string);
    expect(rows.every((r) => r.plan_status === 'draft: NOT APPROVED, do not dispatch')).toBe(true);
    expect(rows[0]?.notice).toMatch(/^NOT APPROVED \(draft\)/);
  });

  it('refuses a viewer anything but an approved plan (403)', async () => {
    const draft = await insertDraftPlan(place, planner.user.id);
    const response = await viewer.get(`/api/plans/${draft.id}/export.csv`);
    expect(response.status).toBe(403);
    expect(response.body.error).toBe('Viewers may export approved plans only; this plan is draft.');
    await planner.post(`/api/plans/${draft.id}/submit`).send({ version: 1 });
    expect((await viewer.get(`/api/plans/${draft.id}/export.csv`)).status).toBe(403);
  });

  it('marks a superseded plan as not current for a planner, and refuses it to a viewer', async () => {
    const older = await approvedPlan('first', { fromHour: 24, hours: 6 });
    await approvedPlan('second', { fromHour: 26, hours: 6 });
    const response = await download(planner, older.id);
    expect(response.status).toBe(200);
    expect(response.headers['content-disposition']).toMatch(/_superseded-not-current\.csv"$/);
    expect(response.headers['x-slackwater-checksum']).toBe(`sha256=${older.checksum}`);
    const rows = rowsOf(response.body as string);
    expect(rows.every((r) => r.plan_status === 'superseded: NOT CURRENT, a newer approved plan replaces it')).toBe(true);
    expect((await viewer.get(`/api/plans/${older.id}/export.csv`)).status).toBe(403);
  });

  it('answers 409 for a plan whose job has not produced a schedule', async () => {
    const pending = await insertDraftPlan(place, planner.user.id, { withResults: false });
    const response = await planner.get(`/api/plans/${pending.id}/export.csv`);
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/no schedule yet/);
  });
});

describe("a plan changed behind the application's back", () => {
  /**
   * The faithful way to tamper: a database superuser (the test cluster's
   * `postgres`) sets session_replication_role = replica, which switches off
   * ordinary triggers for that session only (PostgreSQL manual, "Client
   * Connection Defaults"), then edits the approved plan's series directly.
   * The immutability trigger cannot stop that; the checksum must catch it.
   */
  async function tamper(planId: string) {
    const client = new pg.Client({ connectionString: testDatabaseUrl() });
    await client.connect();
    try {
      await client.query('set session_replication_role = replica');
      await client.query(`update plans set results = jsonb_set(results, '{steps,3,dischargeKw}', '999') where id = $1`, [planId]);
    } finally {
      await client.end();
    }
  }

  it('is never served as approved: export answers 500 with a clear message and no CSV', async () => {
    const plan = await approvedPlan();
    expect((await download(viewer, plan.id)).status).toBe(200);
    await tamper(plan.id);
    const response = await viewer.get(`/api/plans/${plan.id}/export.csv`);
    expect(response.status).toBe(500);
    expect(response.headers['content-type']).toMatch(/application\/json/);
    expect(response.body.error).toMatch(/no longer matches the checksum taken when it was approved/);
    const audit = await sqlRows<{ action: string }>(
      "select action from audit_events where entity_id = $1 and action = 'plan.checksum_mismatch'",
      [plan.id],
    );
    expect(audit).toHaveLength(1);
    const record = await viewer.get(`/api/plans/${plan.id}/sign-off`);
    expect(record.body.checksumVerified).toBe(false);
  });

  it('is caught even when only one hour of a long plan changed', async () => {
    const plan = await approvedPlan('ok', { hours: 40 });
    const rows = rowsOf((await download(planner, plan.id)).body as string);
    expect(rows).toHaveLength(40);
    expect(Date.parse(rows[39]?.interval_end ?? '') - Date.parse(rows[0]?.interval_start ?? '')).toBe(40 * HOUR_MS);
    await tamper(plan.id);
    expect((await planner.get(`/api/plans/${plan.id}/export.csv`)).status).toBe(500);
  });
});
