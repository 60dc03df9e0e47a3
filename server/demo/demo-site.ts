/**
 * The demo scenario's site, battery and profiles, loaded by `npm start` after
 * the demo accounts, as if the demo planner had entered and uploaded them.
 * Everything is invented (sample-data/README.md). Idempotent: the site and
 * battery are found by name, profiles by their file's SHA-256, so a second run
 * adds nothing.
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { batteryCreateSchema } from '@shared/schemas/battery';
import { siteCreateSchema } from '@shared/schemas/site';
import type { ProfileKind } from '@shared/profile-csv';
import { getDb } from '../db/client';
import { listBatteries } from '../batteries/batteries.repo';
import { createBattery } from '../batteries/batteries.service';
import { findSiteProfileBySha256 } from '../profiles/profiles.repo';
import { uploadProfile } from '../profiles/profile-upload.service';
import { findSiteByName } from '../sites/sites.repo';
import { createSite } from '../sites/sites.service';
import { demoActor } from './demo-accounts';

const sampleDir = path.resolve(import.meta.dirname, '..', '..', 'sample-data');
export const DEMO_SITE_NAME = 'Harbourside Depot';
export const DEMO_BATTERY_NAME = 'Depot battery 1';

const DEMO_PROFILES: { file: string; kind: ProfileKind; unit: string; name: string }[] = [
  { file: 'prices-2026-hourly.csv', kind: 'price', unit: 'currency/MWh', name: 'Day-ahead prices 2026 (hourly)' },
  { file: 'site-load-2026-hourly.csv', kind: 'load', unit: 'kW', name: 'Site load 2026 (hourly)' },
  { file: 'pv-generation-2026-hourly.csv', kind: 'generation', unit: 'kW', name: 'Rooftop PV 2026 (hourly)' },
  { file: 'prices-week-2026-05-04-15min.csv', kind: 'price', unit: 'currency/MWh', name: 'Prices week of 4 May 2026 (15 min)' },
  { file: 'site-load-week-2026-05-04-15min.csv', kind: 'load', unit: 'kW', name: 'Site load week of 4 May 2026 (15 min)' },
  {
    file: 'pv-generation-week-2026-05-04-15min.csv',
    kind: 'generation',
    unit: 'kW',
    name: 'Rooftop PV week of 4 May 2026 (15 min)',
  },
];

const readJson = (file: string): Record<string, unknown> =>
  existsSync(path.join(sampleDir, file))
    ? (JSON.parse(readFileSync(path.join(sampleDir, file), 'utf8')) as Record<string, unknown>)
    : {};

export async function seedDemoSite(log: (m: string) => void, databaseUrl: string): Promise<void> {
  const db = getDb();
  const actor = demoActor('planner', databaseUrl);

  let site = await findSiteByName(db, DEMO_SITE_NAME);
  if (!site) {
    // Limits from sample-data/demo-site.json (shared with the engine's command line), with fallbacks.
    const {
      timezone = 'Europe/Berlin',
      importLimitKw = 4000,
      exportLimitKw = 2500,
      demandChargePerKw = null,
    } = readJson('demo-site.json');
    const fields = siteCreateSchema.parse({
      name: DEMO_SITE_NAME,
      timezone,
      importLimitKw,
      exportLimitKw,
      demandChargePerKw,
      currency: 'EUR',
      defaultHorizonHours: 48,
    });
    await createSite(fields, actor);
    site = await findSiteByName(db, DEMO_SITE_NAME);
    log(`Demo site "${DEMO_SITE_NAME}" created.`);
  }
  if (!site) throw new Error('the demo site could not be created');

  if (!(await listBatteries(db, site.id)).some((b) => b.name === DEMO_BATTERY_NAME)) {
    // 2 MW / 4 MWh mirroring sample-data/demo-battery.json; omitted keys take the lithium-ion defaults.
    const input = batteryCreateSchema.parse({
      energyKwh: 4000,
      powerChargeKw: 2000,
      powerDischargeKw: 2000,
      ...readJson('demo-battery.json'),
      name: DEMO_BATTERY_NAME,
    });
    await createBattery(site.id, input, actor);
    log(`Demo battery "${DEMO_BATTERY_NAME}" created.`);
  }

  let uploaded = 0;
  for (const p of DEMO_PROFILES) {
    const bytes = readFileSync(path.join(sampleDir, p.file));
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    if (await findSiteProfileBySha256(db, site.id, p.kind, sha256)) continue;
    await uploadProfile(
      site.id,
      { originalname: p.file, buffer: bytes },
      { kind: p.kind, unit: p.unit, name: p.name, intervalEnding: false, fillGaps: false },
      actor,
    );
    uploaded += 1;
  }
  log(uploaded ? `Demo profiles uploaded: ${uploaded}.` : 'Demo site, battery and profiles present.');
}
