import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { auditEvents, storedForSite } from './support';
import { type CreatedSite, createSite } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let viewer: SignedInAgent;
let site: CreatedSite;

beforeAll(async () => {
  [planner, viewer] = await Promise.all([signInAs(app, 'planner'), signInAs(app, 'viewer')]);
  site = await createSite(planner, { importLimitKw: 5000, exportLimitKw: 4000 });
});

const create = (body: Record<string, unknown>, siteId = site.id) => planner.post(`/api/sites/${siteId}/batteries`).send(body);

describe('creating batteries', () => {
  it('fills every omitted parameter with the lithium-ion defaults and shows no warnings', async () => {
    const response = await create({ name: 'Defaults', energyKwh: 4000 });
    expect(response.status).toBe(201);
    const b = response.body;
    // [S: NREL ATB 2020] 85 % round trip split evenly; 2 h duration; ~1 cycle/day. [M] 10–90 % window.
    expect(b.efficiencyCharge * b.efficiencyDischarge).toBeCloseTo(0.85, 3);
    expect([b.powerChargeKw, b.powerDischargeKw]).toEqual([2000, 2000]);
    expect([b.socMinPct, b.socMaxPct, b.socInitialPct, b.maxCyclesPerDay]).toEqual([10, 90, 50, 1]);
    expect([b.selfDischargePctPerHour, b.degradationCostPerMwh]).toEqual([0, 0]);
    expect(b).toMatchObject({ siteId: site.id, version: 1, warnings: [] });
    const events = await auditEvents(b.id);
    expect(events.map((e) => e.action)).toEqual(['battery.create']);
    expect(events[0]?.details.defaulted).toContain('efficiencyCharge');
  });

  it('stores settings outside common practice but lists a warning for each', async () => {
    const response = await create({
      name: 'Aggressive',
      energyKwh: 1000,
      powerDischargeKw: 3000,
      socMinPct: 0,
      socMaxPct: 100,
      efficiencyCharge: 0.99,
    });
    expect(response.status).toBe(201);
    const fields = response.body.warnings.map((w: { field: string }) => w.field);
    expect(fields).toEqual(expect.arrayContaining(['socMinPct', 'socMaxPct', 'efficiencyCharge', 'powerDischargeKw']));
  });

  it('refuses an initial SoC outside the window with 422 on that field and stores nothing', async () => {
    const before = (await planner.get(`/api/sites/${site.id}/batteries`)).body.length;
    const response = await create({ name: 'Broken', energyKwh: 1000, socInitialPct: 95 });
    expect(response.status).toBe(422);
    expect(response.body.issues).toEqual([expect.objectContaining({ path: 'socInitialPct' })]);
    expect((await planner.get(`/api/sites/${site.id}/batteries`)).body.length).toBe(before);
  });

  it('refuses a missing energy, NaN-like text and fields the client may not set', async () => {
    expect((await create({ name: 'No energy' })).status).toBe(422);
    expect((await create({ name: 'Text', energyKwh: 'NaN' })).status).toBe(422);
    const sneaky = await create({ name: 'Sneaky', energyKwh: 100, version: 7, siteId: '00000000-0000-4000-8000-000000000000' });
    expect(sneaky.status).toBe(422);
  });

  it('answers 404 for batteries of a site that does not exist', async () => {
    expect((await create({ name: 'Lost', energyKwh: 100 }, '00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await viewer.get('/api/sites/00000000-0000-4000-8000-000000000000/batteries')).status).toBe(404);
  });

  it('refuses a second battery with the same name at the site (409)', async () => {
    await create({ name: 'Twin', energyKwh: 100 });
    expect((await create({ name: 'twin', energyKwh: 100 })).status).toBe(409);
  });

  it('warns when the battery can charge faster than the site may import', async () => {
    const response = await create({ name: 'Big', energyKwh: 12000 });
    expect(response.body.warnings.map((w: { field: string }) => w.field)).toEqual(['powerChargeKw', 'powerDischargeKw']);
  });
});

describe('editing batteries', () => {
  it('applies a change at the version read, bumps the version and records from → to', async () => {
    const { body: battery } = await create({ name: 'Editable', energyKwh: 2000 });
    const response = await planner
      .patch(`/api/batteries/${battery.id}`)
      .send({ version: 1, socMaxPct: 95, degradationCostPerMwh: 12 });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ version: 2, socMaxPct: 95, degradationCostPerMwh: 12, socMinPct: 10 });
    const update = (await auditEvents(battery.id)).find((e) => e.action === 'battery.update');
    expect(update?.details.changes).toEqual({ socMaxPct: { from: 90, to: 95 }, degradationCostPerMwh: { from: 0, to: 12 } });
  });

  it('refuses a stale version with 409 and keeps the newer values', async () => {
    const { body: battery } = await create({ name: 'Contested', energyKwh: 2000 });
    expect((await planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, name: 'Contested A' })).status).toBe(200);
    const stale = await planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, name: 'Contested B' });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/changed by someone else/);
    expect((await viewer.get(`/api/batteries/${battery.id}`)).body.name).toBe('Contested A');
  });

  it('lets exactly one of two simultaneous edits of the same version win', async () => {
    const { body: battery } = await create({ name: 'Race', energyKwh: 2000 });
    const [a, b] = await Promise.all([
      planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, socMinPct: 15 }),
      planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, socMinPct: 20 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect((await viewer.get(`/api/batteries/${battery.id}`)).body.version).toBe(2);
  });

  it('validates the merged battery: a new minimum above the stored maximum is refused', async () => {
    const { body: battery } = await create({ name: 'Window', energyKwh: 2000 });
    const response = await planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, socMinPct: 95 });
    expect(response.status).toBe(422);
    expect(response.body.issues[0].path).toBe('socMaxPct');
  });

  it('requires the version and refuses keys the client may not set', async () => {
    const { body: battery } = await create({ name: 'Strict', energyKwh: 2000 });
    expect((await planner.patch(`/api/batteries/${battery.id}`).send({ socMinPct: 12 })).status).toBe(422);
    expect((await planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, siteId: site.id })).status).toBe(422);
    expect((await planner.patch(`/api/batteries/${battery.id}`).send({ version: 1, createdBy: 'x' })).status).toBe(422);
  });
});

describe('who may change batteries', () => {
  it('lets a viewer read but not create or edit (403), and nothing is stored', async () => {
    const { body: battery } = await create({ name: 'Read only', energyKwh: 500 });
    const before = await storedForSite(site.id);
    expect((await viewer.get(`/api/sites/${site.id}/batteries`)).status).toBe(200);
    expect((await viewer.get(`/api/batteries/${battery.id}`)).status).toBe(200);
    expect((await viewer.post(`/api/sites/${site.id}/batteries`).send({ name: 'V', energyKwh: 1 })).status).toBe(403);
    expect((await viewer.patch(`/api/batteries/${battery.id}`).send({ version: 1, name: 'V' })).status).toBe(403);
    expect(await storedForSite(site.id)).toEqual(before);
  });
});

describe('battery counts on sites', () => {
  it('counts the batteries of each site in the list and the detail', async () => {
    const own = await createSite(planner, {});
    await create({ name: 'Counted A', energyKwh: 2000 }, own.id);
    await create({ name: 'Counted B', energyKwh: 2000 }, own.id);
    const detail = await viewer.get(`/api/sites/${own.id}`);
    expect(detail.body.batteryCount).toBe(2);
    const list = await viewer.get('/api/sites');
    const listed = (list.body as { id: string; batteryCount: number; profileCount: number }[]).find((s) => s.id === own.id);
    expect(listed).toMatchObject({ batteryCount: 2, profileCount: 0 });
  });
});
