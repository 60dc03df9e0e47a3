/**
 * Every bad upload input through the real upload endpoint: the right status,
 * the line, nothing stored, the server still answering. The files and their
 * expected lines are the hand-written ones in sample-data/broken (its README).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { storedForSite } from '../sites/support';
import { sample, sampleDir } from './support';
import { type CreatedSite, createSite, upload } from '../support/api-fixtures';

interface ExpectedCase {
  file: string;
  options: { kind: string; unit: string; timezone: string };
  issues: { line: number; messageIncludes: string }[];
  acceptedWithFillGaps?: { filledIndexes: number[]; values: number[] };
}
const cases = JSON.parse(readFileSync(path.join(sampleDir, 'broken', 'expected-issues.json'), 'utf8')) as ExpectedCase[];

const app = createTestApp();
let planner: SignedInAgent;
let site: CreatedSite;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  site = await createSite(planner, { timezone: 'Europe/Berlin' });
});

describe('rejected uploads', () => {
  it.each(cases.map((c) => [c.file, c] as const))('rejects %s with 422, its line numbers and nothing stored', async (file, c) => {
    expect(c.options.timezone).toBe(site.timezone);
    const before = await storedForSite(site.id);
    const response = await upload(planner, site.id, sample(`broken/${file}`), file, {
      kind: c.options.kind,
      unit: c.options.unit,
    });
    expect(response.status).toBe(422);
    expect(response.body.issues.map((i: { line: number }) => i.line)).toEqual(c.issues.map((i) => i.line));
    c.issues.forEach((expected, k) => expect(response.body.issues[k].message).toContain(expected.messageIncludes));
    expect(response.body.hint).toMatch(/Nothing was stored/);
    expect(response.body.error).toContain(file);
    expect(await storedForSite(site.id)).toEqual(before);
  });

  it('rejects a file that is not .csv or .txt by name before reading it', async () => {
    const before = await storedForSite(site.id);
    const response = await upload(planner, site.id, sample('prices-week-2026-05-04-15min.csv'), 'prices.xlsx');
    expect(response.status).toBe(422);
    expect(response.body.issues).toEqual([{ line: 0, message: expect.stringMatching(/only \.csv/) }]);
    expect(await storedForSite(site.id)).toEqual(before);
  });

  it('rejects an upload without a file, with a file in another field, or with options that do not fit', async () => {
    const before = await storedForSite(site.id);
    const noFile = await planner.post(`/api/sites/${site.id}/profiles`).field('kind', 'price').field('unit', 'currency/MWh');
    expect(noFile.status).toBe(422);
    expect(noFile.body.issues[0].message).toMatch(/field "file"/);

    const wrongField = await planner
      .post(`/api/sites/${site.id}/profiles`)
      .field('kind', 'price')
      .field('unit', 'currency/MWh')
      .attach('upload', Buffer.from('time,price\n'), 'p.csv');
    expect(wrongField.status).toBe(422);
    expect(wrongField.body.issues[0].message).toMatch(/form field "file"/);

    const wrongUnit = await upload(planner, site.id, sample('prices-week-2026-05-04-15min.csv'), 'p.csv', {
      kind: 'price',
      unit: 'kW',
    });
    expect(wrongUnit.status).toBe(422);
    expect(wrongUnit.body.issues).toEqual([expect.objectContaining({ line: 0, path: 'unit' })]);

    const json = await planner
      .post(`/api/sites/${site.id}/profiles`)
      .send({ kind: 'price', unit: 'currency/MWh', file: 'time,price' });
    expect(json.status).toBe(422);
    expect(await storedForSite(site.id)).toEqual(before);
  });

  it('answers 404 for an upload to a site that does not exist, storing nothing', async () => {
    const response = await upload(planner, '00000000-0000-4000-8000-000000000000', sample('broken/gap.csv'), 'gap.csv');
    expect(response.status).toBe(404);
  });
});

describe('accepted uploads of unusual but valid files', () => {
  it('accepts a gap when gap filling is asked for, listing the filled intervals', async () => {
    const c = cases.find((x) => x.acceptedWithFillGaps);
    if (!c?.acceptedWithFillGaps) throw new Error('sample-data/broken/expected-issues.json lost its gap-filling case');
    const response = await upload(planner, site.id, sample(`broken/${c.file}`), c.file, { fillGaps: true });
    expect(response.status).toBe(201);
    expect(response.body.filledCount).toBe(c.acceptedWithFillGaps.filledIndexes.length);
    const detail = await planner.get(`/api/profiles/${response.body.id}`);
    expect(detail.body.filledIndexes).toEqual(c.acceptedWithFillGaps.filledIndexes);
    expect(detail.body.values).toEqual(c.acceptedWithFillGaps.values);
  });

  it('accepts a byte order mark, CRLF line ends and a quoted field spanning lines, and says so', async () => {
    const response = await upload(planner, site.id, sample('formats/bom-crlf-quoted-newlines.csv'), 'bom.csv');
    expect(response.status).toBe(201);
    expect(response.body.notes.join(' ')).toMatch(/byte order mark/);
  });

  it('accepts explicit offsets other than the site zone as the instants they state, and says so', async () => {
    // RFC 3339: "Z" and ±hh:mm name exact instants; 00:00Z is 01:00 in Berlin in January.
    const text = 'time,price\n2026-01-10T00:00:00Z,40\n2026-01-10T01:00:00Z,41\n2026-01-10T02:00:00Z,-3.5\n';
    const response = await upload(planner, site.id, text, 'utc.csv');
    expect(response.status).toBe(201);
    expect(response.body.start).toBe('2026-01-10T00:00:00.000Z');
    expect(response.body.notes.join(' ')).toMatch(/offset other than Europe\/Berlin/);
  });
});

describe('after every rejection above', () => {
  it('still answers: the health check reports the database up', async () => {
    const response = await request(app).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ok: true, db: 'up' });
  });
});
