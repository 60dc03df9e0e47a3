/**
 * Size limit, a year of 5-minute data, and properties (fast-check) that no input
 * bytes crash the upload endpoint or leave anything behind when refused
 * (SECURITY.md "Tests that make the bar real" 2; ASVS 5.0 5.2.1).
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { MAX_PROFILE_UPLOAD_BYTES } from '@shared/schemas/profile';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { storedForSite } from '../sites/support';
import { type CreatedSite, createSite, upload } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let site: CreatedSite;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  site = await createSite(planner, { timezone: 'UTC' });
});

describe('the 20 MB limit', () => {
  it('answers 413 one byte past 20 MB and stores nothing', async () => {
    const before = await storedForSite(site.id);
    const response = await upload(planner, site.id, Buffer.alloc(MAX_PROFILE_UPLOAD_BYTES + 1, 0x61), 'big.csv');
    expect(response.status).toBe(413);
    expect(response.body.error).toMatch(/larger than 20 MB/);
    expect(await storedForSite(site.id)).toEqual(before);
    expect((await request(app).get('/api/health')).status).toBe(200);
  });

  it('reads a file of exactly 20 MB (refused for its content, not its size)', async () => {
    const response = await upload(planner, site.id, Buffer.alloc(MAX_PROFILE_UPLOAD_BYTES, 0x61), 'exact.csv');
    expect(response.status).toBe(422);
    expect(response.body.issues[0].line).toBe(1);
  });
});

describe('a year of 5-minute data', () => {
  it('accepts 105 120 intervals and serves a one-day window of them', async () => {
    // [D] 365 days × 288 five-minute intervals = 105 120; values follow a formula so any index can be checked.
    const start = Date.UTC(2026, 0, 1);
    const valueAt = (k: number) => Math.round(1000 * (50 + 40 * Math.sin(k / 37))) / 1000;
    const lines = ['time,price'];
    for (let k = 0; k < 105_120; k += 1)
      lines.push(`${new Date(start + k * 300_000).toISOString().replace('.000Z', 'Z')},${valueAt(k)}`);
    const file = Buffer.from(`${lines.join('\n')}\n`);
    expect(file.length).toBeLessThan(MAX_PROFILE_UPLOAD_BYTES);

    const response = await upload(planner, site.id, file, 'five-minute-year.csv');
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      valueCount: 105_120,
      stepMinutes: 5,
      start: '2026-01-01T00:00:00.000Z',
      end: '2027-01-01T00:00:00.000Z',
    });

    // 1 July 00:00 UTC is day 181 of 2026 [D: 31+28+31+30+31+30], index 181 × 288 = 52 128.
    const day = await planner
      .get(`/api/profiles/${response.body.id}`)
      .query({ from: '2026-07-01T00:00:00Z', to: '2026-07-02T00:00:00Z' });
    expect(day.body.window.offset).toBe(52_128);
    expect(day.body.values).toHaveLength(288);
    expect(day.body.values).toEqual(Array.from({ length: 288 }, (_, i) => valueAt(52_128 + i)));
  });
});

describe('properties', () => {
  it('never crashes on random bytes: each upload is 201 or 422, and a 422 stores nothing', async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ maxLength: 600 }), async (bytes) => {
        const before = await storedForSite(site.id);
        const response = await upload(planner, site.id, Buffer.from(bytes), 'random.csv');
        expect([201, 422]).toContain(response.status);
        const after = await storedForSite(site.id);
        expect(after.profiles - before.profiles).toBe(response.status === 201 ? 1 : 0);
      }),
      { numRuns: 15, seed: 5 },
    );
    expect((await request(app).get('/api/health')).status).toBe(200);
  });

  it('never crashes on CSV-like text mixing good rows with BOMs, CR/LF, quotes, NUL, NaN and 1e309', async () => {
    const fragment = fc.constantFrom(
      '2026-03-01T00:00:00Z,10',
      '2026-03-01T01:00:00Z,-5.5',
      '2026-03-01T01:00:00Z,7',
      '2026-03-29T02:00,3',
      '\uFEFF',
      '\r\n',
      '\n',
      '\r',
      '"',
      '"a\nb"',
      ';',
      ',',
      '\u0000',
      'NaN',
      '1e309',
      'x'.repeat(5000),
    );
    await fc.assert(
      fc.asyncProperty(fc.array(fragment, { maxLength: 30 }), async (parts) => {
        const before = await storedForSite(site.id);
        const response = await upload(planner, site.id, `time,price\n${parts.join('')}`, 'mixed.csv');
        expect([201, 422]).toContain(response.status);
        if (response.status === 422) expect(response.body.issues.length).toBeGreaterThan(0);
        const after = await storedForSite(site.id);
        expect(after.profiles - before.profiles).toBe(response.status === 201 ? 1 : 0);
      }),
      { numRuns: 20, seed: 7 },
    );
  });
});
