/** Helpers for the site, battery and profile API tests (real app, real test database). */
import { randomUUID } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import { expect } from 'vitest';
import { getPool } from '../../server/db/client';

/** A site name no other test (or earlier run) uses, so tests never collide on the unique name. */
export const uniqueName = (prefix: string) => `${prefix} ${randomUUID().slice(0, 8)}`;

export interface CreatedSite {
  id: string;
  name: string;
  timezone: string;
}

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

/** Rows stored for a site: profiles, and audit events naming the site (uploads, deletes, battery changes). */
export async function storedForSite(siteId: string) {
  const pool = getPool();
  const profiles = await pool.query<{ n: number }>('select count(*)::int as n from profiles where site_id = $1', [siteId]);
  const audit = await pool.query<{ n: number }>("select count(*)::int as n from audit_events where details->>'siteId' = $1", [
    siteId,
  ]);
  return { profiles: profiles.rows[0]?.n ?? -1, audit: audit.rows[0]?.n ?? -1 };
}

export async function auditEvents(entityId: string) {
  const result = await getPool().query<{
    action: string;
    actor_id: string;
    actor_email: string;
    details: Record<string, unknown>;
  }>('select action, actor_id, actor_email, details from audit_events where entity_id = $1 order by id', [entityId]);
  return result.rows;
}
