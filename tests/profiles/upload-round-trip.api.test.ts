/**
 * A good upload stores the regular series, the original bytes with their
 * SHA-256 and the uploader, and reads back the same. Expected values come from
 * outside the app: coreutils `sha256sum`, a plain split of the CSV text, and the
 * sample-data README's published counts.
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { auditEvents } from '../sites/support';
import { readColumn, sample, sampleDir } from './support';
import { type CreatedSite, createSite, upload } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let viewer: SignedInAgent;
let site: CreatedSite;

beforeAll(async () => {
  [planner, viewer] = await Promise.all([signInAs(app, 'planner'), signInAs(app, 'viewer')]);
  site = await createSite(planner, { timezone: 'Europe/Berlin' });
});

const WEEK = 'prices-week-2026-05-04-15min.csv';

describe('uploading the 15-minute price week', () => {
  let id: string;

  it('answers 201 with the profile: 672 quarter-hours from Monday 00:00 Berlin time', async () => {
    const response = await upload(planner, site.id, sample(WEEK), WEEK, { name: 'Week ahead' });
    expect(response.status).toBe(201);
    id = response.body.id;
    // [S: sample-data/README.md] 672 rows, 15 min, Mon 2026-05-04 00:00 (+02:00, summer time) to the next Monday.
    expect(response.body).toMatchObject({
      siteId: site.id,
      kind: 'price',
      name: 'Week ahead',
      unit: 'currency/MWh',
      sourceUnit: 'currency/MWh',
      stepMinutes: 15,
      valueCount: 672,
      filledCount: 0,
      start: '2026-05-03T22:00:00.000Z',
      end: '2026-05-10T22:00:00.000Z',
      originalFilename: WEEK,
      originalBytes: sample(WEEK).length,
    });
  });

  it('stores the SHA-256 that coreutils sha256sum computes for the file', () => {
    const digest = spawnSync('sha256sum', [path.join(sampleDir, WEEK)], { encoding: 'utf8' }).stdout.split(' ')[0];
    expect(digest).toMatch(/^[0-9a-f]{64}$/);
    return viewer.get(`/api/profiles/${id}`).then((r) => expect(r.body.originalSha256).toBe(digest));
  });

  it('gives back the original file byte for byte', async () => {
    const response = await viewer
      .get(`/api/profiles/${id}/original`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(response.status).toBe(200);
    expect(response.headers['content-disposition']).toContain(WEEK);
    expect(Buffer.compare(response.body as Buffer, sample(WEEK))).toBe(0);
  });

  it('stores every value as written, with min, max and the negative prices the README lists', async () => {
    const expected = readColumn(sample(WEEK), 'price');
    const detail = await viewer.get(`/api/profiles/${id}`);
    expect(detail.body.values).toEqual(expected);
    expect(detail.body.min).toBe(Math.min(...expected));
    expect(detail.body.max).toBe(Math.max(...expected));
    // [S: sample-data/README.md] 45 negative quarter-hours in the week.
    expect(detail.body.values.filter((v: number) => v < 0)).toHaveLength(45);
  });

  it('returns only the intervals of a requested window (from inclusive, to exclusive)', async () => {
    const all = readColumn(sample(WEEK), 'price');
    // Tuesday 00:00 to Wednesday 00:00 Berlin time = quarter-hours 96..191 [D: 24 h × 4 per hour].
    const day = await viewer
      .get(`/api/profiles/${id}`)
      .query({ from: '2026-05-05T00:00:00+02:00', to: '2026-05-06T00:00:00+02:00' });
    expect(day.status).toBe(200);
    expect(day.body.window).toEqual({ offset: 96, start: '2026-05-04T22:00:00.000Z', count: 96 });
    expect(day.body.values).toEqual(all.slice(96, 192));
    const beyond = await viewer.get(`/api/profiles/${id}`).query({ from: '2027-01-01T00:00:00Z' });
    expect(beyond.body.values).toEqual([]);
    const reversed = await viewer.get(`/api/profiles/${id}`).query({ from: '2026-05-06T00:00:00Z', to: '2026-05-05T00:00:00Z' });
    expect(reversed.status).toBe(422);
    expect((await viewer.get(`/api/profiles/${id}`).query({ from: 'yesterday' })).status).toBe(422);
  });

  it('lists the profile for the site and records the upload with who did it', async () => {
    const list = await viewer.get(`/api/sites/${site.id}/profiles`).query({ kind: 'price' });
    expect(list.body.map((p: { id: string }) => p.id)).toContain(id);
    expect(list.body[0]).not.toHaveProperty('values');
    const events = await auditEvents(id);
    expect(events.map((e) => e.action)).toEqual(['profile.upload']);
    expect(events[0]?.details).toMatchObject({ siteId: site.id, filename: WEEK, valueCount: 672 });
    const detail = await viewer.get(`/api/profiles/${id}`);
    expect(detail.body.uploadedBy).toBe(events[0]?.actor_id);
  });
});

describe('upload options and formats', () => {
  it('converts interval-ending MWh per hour to average kW starting one hour earlier', async () => {
    const file = 'formats/site-load-day-interval-ending-mwh.csv';
    const response = await upload(planner, site.id, sample(file), 'load.csv', {
      kind: 'load',
      unit: 'MWh',
      intervalEnding: true,
    });
    expect(response.status).toBe(201);
    const detail = await viewer.get(`/api/profiles/${response.body.id}`);
    // [D] energy E MWh over a 1-hour interval is an average power of E × 1000 kW.
    const mwh = readColumn(sample(file), 'load');
    detail.body.values.forEach((v: number, k: number) => expect(v).toBeCloseTo((mwh[k] ?? NaN) * 1000, 9));
    expect(detail.body.unit).toBe('kW');
    expect(detail.body.intervalEnding).toBe(true);
  });

  it('reads local times, semicolons and decimal commas', async () => {
    const file = 'formats/prices-day-local-semicolon-decimal-comma.csv';
    const response = await upload(planner, site.id, sample(file), 'local.csv');
    expect(response.status).toBe(201);
    // [S: sample-data/README.md] 2026-05-05 local, no DST change: Berlin is at +02:00, so 00:00 local = 22:00Z the day before.
    expect(response.body.start).toBe('2026-05-04T22:00:00.000Z');
    const detail = await viewer.get(`/api/profiles/${response.body.id}`);
    expect(detail.body.values).toEqual(readColumn(sample(file), 'price', ';', true));
  });

  it('accepts a whole year of hourly prices across both daylight-saving changes', async () => {
    const response = await upload(planner, site.id, sample('prices-2026-hourly.csv'), 'year.csv');
    expect(response.status).toBe(201);
    // [D] 2026 has 365 days = 8760 hours; the 23- and 25-hour DST days cancel out.
    expect(response.body.valueCount).toBe(8760);
    expect(response.body.start).toBe('2025-12-31T23:00:00.000Z');
  });
});
