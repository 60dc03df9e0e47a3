/**
 * `POST /api/sites/:id/profiles` with the fields `dateOrder` and `decimalSeparator`: a file
 * written the way a European spreadsheet writes it (08.12.2026 00:00; 1.010,25) is stored
 * when the upload declares both, and refused by line, storing nothing, when it does not.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { createSite, type CreatedSite } from '../support/api-fixtures';
import { upload } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let site: CreatedSite;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  site = await createSite(planner, { timezone: 'Europe/Berlin' });
});

// Invented values: a day-first date with a 24-hour clock, a decimal comma and points between thousands.
const spreadsheetFile = ['Zeitpunkt;Last', '08.12.2026 00:00;1.010,25', '08.12.2026 00:15;998,5', '08.12.2026 00:30;1.002'].join(
  '\r\n',
);

const profileCount = async () => (await planner.get(`/api/sites/${site.id}/profiles`)).body.length as number;

describe('uploading a file with declared date order and decimal separator', () => {
  it('stores it when both are declared, read as the file writes them', async () => {
    const response = await upload(planner, site.id, spreadsheetFile, 'last.csv', {
      kind: 'load',
      unit: 'kW',
      dateOrder: 'dmy',
      decimalSeparator: ',',
    });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    // [D] 08.12.2026 00:00 day first is 8 December, local midnight in Berlin (+01:00 in winter).
    expect(response.body).toMatchObject({ stepMinutes: 15, valueCount: 3, start: '2026-12-07T23:00:00.000Z' });
    const profile = await planner.get(`/api/profiles/${response.body.id}`);
    // [D] 1.010,25 = 1010.25; 998,5 = 998.5; 1.002 = 1002 (a point between thousands once the comma is decimal).
    expect(profile.body.values).toEqual([1010.25, 998.5, 1002]);
    expect(profile.body.notes.join(' ')).toMatch(/decimal comma and points between thousands, as chosen/);
  });

  it('refuses it by line and stores nothing when the date order is not declared', async () => {
    const before = await profileCount();
    const response = await upload(planner, site.id, spreadsheetFile, 'last.csv', {
      kind: 'load',
      unit: 'kW',
      decimalSeparator: ',',
    });
    expect(response.status).toBe(422);
    expect(response.body.issues[0]).toMatchObject({ line: 1 });
    expect(response.body.issues[0].message).toMatch(/08\.12\.2026 00:00.*Choose the file's date order/);
    expect(await profileCount()).toBe(before);
  });

  it('refuses an unknown date order or separator on the form line (422, line 0)', async () => {
    const response = await upload(planner, site.id, spreadsheetFile, 'last.csv', {
      kind: 'load',
      unit: 'kW',
      dateOrder: 'ymd',
      decimalSeparator: ';',
    });
    expect(response.status).toBe(422);
    expect(response.body.issues.map((i: { line: number; path: string }) => [i.line, i.path])).toEqual([
      [0, 'dateOrder'],
      [0, 'decimalSeparator'],
    ]);
  });

  it('reads an empty field as not declared, as a browser form sends an unset choice', async () => {
    const iso = ['time,price', '2026-12-08T00:00:00+01:00,10', '2026-12-08T01:00:00+01:00,11'].join('\n');
    const response = await upload(planner, site.id, iso, 'iso.csv', { dateOrder: '', decimalSeparator: '' });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
  });
});
