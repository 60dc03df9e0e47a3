/**
 * Price units in the site's currency: a EUR site (like the demo site) takes
 * EUR/MWh and EUR/kWh beside the generic currency/MWh; another currency is
 * refused on the unit field and nothing is stored.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { storedForSite } from '../sites/support';
import { createSite, upload, type CreatedSite } from '../support/api-fixtures';
import { readColumn, sample } from './support';

const app = createTestApp();
let planner: SignedInAgent;
let site: CreatedSite;
const WEEK = 'prices-week-2026-05-04-15min.csv';

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  site = await createSite(planner, { timezone: 'Europe/Berlin', currency: 'EUR' });
});

describe('price units on a EUR site', () => {
  it('accepts EUR/MWh with the same values as currency/MWh', async () => {
    const response = await upload(planner, site.id, sample(WEEK), WEEK, { unit: 'EUR/MWh', name: 'Week in EUR/MWh' });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    // [S: sample-data/README.md] the week has 672 quarter-hours; the stored unit is the canonical currency/MWh.
    expect(response.body).toMatchObject({ unit: 'currency/MWh', stepMinutes: 15, valueCount: 672 });
    const read = await planner.get(`/api/profiles/${response.body.id}`);
    // [D] the file's own column read with Number(): EUR/MWh is the site's currency per MWh, so no scaling.
    const column = readColumn(sample(WEEK), 'price');
    expect(read.body.values.slice(0, 5)).toEqual(column.slice(0, 5));
  });

  it('refuses USD/MWh with 422 naming the unit field and stores nothing', async () => {
    const before = await storedForSite(site.id);
    const response = await upload(planner, site.id, sample(WEEK), WEEK, { unit: 'USD/MWh', name: 'Week in USD' });
    expect(response.status).toBe(422);
    const unitIssue = (response.body.issues as { path?: string; message: string }[]).find((i) => i.path === 'unit');
    expect(unitIssue?.message).toMatch(/^unit: /);
    expect(unitIssue?.message).toContain('EUR');
    expect(await storedForSite(site.id)).toEqual(before);
  });
});
