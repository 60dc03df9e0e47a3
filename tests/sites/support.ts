/** What the site, battery and profile API tests read back from the real test database. */
import { getPool } from '../../server/db/client';

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
