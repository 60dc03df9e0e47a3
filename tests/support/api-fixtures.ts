/**
 * What the API tests make through the real API (sites, batteries, profile
 * uploads) and read back from the real test database, shared by every module's
 * tests so each file states only what differs.
 */
import { randomUUID } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import { expect } from 'vitest';
import { getPool } from '../../server/db/client';

export const HOUR_MS = 3_600_000;

/** RFC 3339 UTC text of an epoch-millisecond instant. */
export const iso = (ms: number) => new Date(ms).toISOString();

/** A name no other test (or earlier run) uses, so tests never collide on unique names. */
export const uniqueName = (prefix: string) => `${prefix} ${randomUUID().slice(0, 8)}`;

/** Raw SQL against the test database, outside the application. */
export async function sqlRows<T extends Record<string, unknown>>(text: string, values: unknown[] = []): Promise<T[]> {
  return (await getPool().query<T>(text, values)).rows;
}

export interface CreatedSite {
  id: string;
  name: string;
  timezone: string;
}

/** A Berlin site with import and export limits (5 MW / 4 MW) unless `fields` say otherwise. */
export async function createSite(agent: TestAgent, fields: Record<string, unknown> = {}): Promise<CreatedSite> {
  const response = await agent.post('/api/sites').send({
    name: uniqueName('Test site'),
    timezone: 'Europe/Berlin',
    importLimitKw: 5000,
    exportLimitKw: 4000,
    currency: 'EUR',
    ...fields,
  });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body as CreatedSite;
}

/** Battery "Unit 1", 1 MW / 2 MWh with the lithium-ion defaults for the rest, unless `fields` say otherwise. */
export async function createBattery(agent: TestAgent, siteId: string, fields: Record<string, unknown> = {}): Promise<string> {
  const response = await agent
    .post(`/api/sites/${siteId}/batteries`)
    .send({ name: 'Unit 1', energyKwh: 2000, powerChargeKw: 1000, powerDischargeKw: 1000, ...fields });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return (response.body as { id: string }).id;
}

export interface UploadFields {
  kind?: string;
  unit?: string;
  name?: string;
  intervalEnding?: boolean;
  fillGaps?: boolean;
  dateOrder?: string;
  decimalSeparator?: string;
}

/** POST /api/sites/:id/profiles as a browser form would send it (a price profile unless `fields` say otherwise). */
export function upload(agent: TestAgent, siteId: string, file: Buffer | string, filename: string, fields: UploadFields = {}) {
  const all = { kind: 'price', unit: 'currency/MWh', ...fields };
  let req = agent.post(`/api/sites/${siteId}/profiles`);
  for (const [key, value] of Object.entries(all)) req = req.field(key, String(value));
  return req.attach('file', typeof file === 'string' ? Buffer.from(file, 'utf8') : file, filename);
}

export interface SeriesSpec {
  /** Values per step: currency/MWh for prices, kW for load and generation. */
  values: readonly number[];
  startMs: number;
  stepMinutes: number;
}

/** A regular series as CSV, times in UTC (the upload reader accepts any consistent offset). */
function seriesCsv(spec: SeriesSpec): Buffer {
  const lines = ['time,value'];
  spec.values.forEach((v, i) => lines.push(`${iso(spec.startMs + i * spec.stepMinutes * 60_000)},${v}`));
  return Buffer.from(`${lines.join('\n')}\n`);
}

/** Uploads a series as a profile of `kind` (prices in currency/MWh, power in kW) and returns its id. */
export async function uploadSeries(
  agent: TestAgent,
  siteId: string,
  kind: 'price' | 'load' | 'generation',
  spec: SeriesSpec,
  name = `Invented ${kind}`,
): Promise<string> {
  const response = await upload(agent, siteId, seriesCsv(spec), `${kind}.csv`, {
    kind,
    unit: kind === 'price' ? 'currency/MWh' : 'kW',
    name,
  });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return (response.body as { id: string }).id;
}
