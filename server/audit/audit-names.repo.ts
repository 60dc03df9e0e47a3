/**
 * The names behind the ids an audit page mentions. The trail stores ids (names change
 * and rows are deleted, the trail must not), the page shows names; so names are looked up
 * when a page is read. The one place outside their modules that reads these tables, and
 * only their names.
 */
import { eq, inArray } from 'drizzle-orm';
import { createZoneClock, formatInstant } from '@shared/profile-csv';
import type { DbOrTx } from '../db/client';
import { batteries } from '../batteries/batteries.schema';
import { plans } from '../plans/plans.schema';
import { profiles } from '../profiles/profiles.schema';
import { sites } from '../sites/sites.schema';
import { horizonStudies } from '../studies/studies.schema';
import { users } from '../users/users.schema';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** "2026-12-04 00:00 +01:00": the app's one way of writing a time, in the site's zone. */
function localTime(at: Date, timezone: string | null): string {
  const clock = timezone ? createZoneClock(timezone) : null;
  const text = clock ? formatInstant(at.getTime(), clock) : `${at.toISOString().slice(0, 19)}+00:00`;
  return `${text.slice(0, 10)} ${text.slice(11, 16)} ${text.slice(19)}`;
}

/** Id → display name for every id given that names a user, site, battery, profile, plan or study. */
export async function namesOfIds(db: DbOrTx, candidates: Iterable<string>): Promise<Map<string, string>> {
  const all = [...new Set(candidates)];
  const ids = all.filter((id) => UUID.test(id));
  const names = new Map<string, string>();
  if (all.length === 0) return names;
  // User ids are text (not always UUIDs).
  for (const u of await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, all)))
    names.set(u.id, u.name);
  if (ids.length === 0) return names;
  const [siteRows, batteryRows, profileRows, planRows, studyRows] = await Promise.all([
    db.select({ id: sites.id, name: sites.name }).from(sites).where(inArray(sites.id, ids)),
    db.select({ id: batteries.id, name: batteries.name }).from(batteries).where(inArray(batteries.id, ids)),
    db.select({ id: profiles.id, name: profiles.name }).from(profiles).where(inArray(profiles.id, ids)),
    db
      .select({ id: plans.id, battery: batteries.name, start: plans.deliveryStart, timezone: sites.timezone })
      .from(plans)
      .leftJoin(batteries, eq(batteries.id, plans.batteryId))
      .leftJoin(sites, eq(sites.id, plans.siteId))
      .where(inArray(plans.id, ids)),
    db
      .select({ id: horizonStudies.id, battery: batteries.name, start: horizonStudies.periodStart, timezone: sites.timezone })
      .from(horizonStudies)
      .leftJoin(batteries, eq(batteries.id, horizonStudies.batteryId))
      .leftJoin(sites, eq(sites.id, horizonStudies.siteId))
      .where(inArray(horizonStudies.id, ids)),
  ]);
  for (const row of [...siteRows, ...batteryRows, ...profileRows]) names.set(row.id, row.name);
  for (const p of planRows) names.set(p.id, `plan for ${p.battery ?? 'a battery'} from ${localTime(p.start, p.timezone)}`);
  for (const s of studyRows)
    names.set(s.id, `horizon study for ${s.battery ?? 'a battery'} from ${localTime(s.start, s.timezone)}`);
  return names;
}
