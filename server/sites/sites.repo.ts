import { asc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { batteries } from '../batteries/batteries.schema';
import { profiles } from '../profiles/profiles.schema';
import { sites, type SiteRow } from './sites.schema';

export type SiteValues = Omit<typeof sites.$inferInsert, 'id' | 'createdAt' | 'updatedAt'>;

// Drizzle renders a column of the outer table unqualified, which inside the subquery would
// name the inner table's id: qualify the outer table explicitly.
const counts = {
  batteryCount: sql<number>`(select count(*)::int from ${batteries} where ${batteries.siteId} = "sites"."id")`,
  profileCount: sql<number>`(select count(*)::int from ${profiles} where ${profiles.siteId} = "sites"."id")`,
};

export type SiteWithCounts = SiteRow & { batteryCount: number; profileCount: number };

export async function listSites(db: DbOrTx): Promise<SiteWithCounts[]> {
  return db
    .select({ site: sites, ...counts })
    .from(sites)
    .orderBy(asc(sql`lower(${sites.name})`))
    .then((rows) => rows.map((r) => ({ ...r.site, batteryCount: r.batteryCount, profileCount: r.profileCount })));
}

export async function findSite(db: DbOrTx, id: string): Promise<SiteWithCounts | undefined> {
  const [row] = await db
    .select({ site: sites, ...counts })
    .from(sites)
    .where(eq(sites.id, id));
  return row && { ...row.site, batteryCount: row.batteryCount, profileCount: row.profileCount };
}

export async function findSiteByName(db: DbOrTx, name: string): Promise<SiteRow | undefined> {
  const [row] = await db
    .select()
    .from(sites)
    .where(eq(sql`lower(${sites.name})`, name.toLowerCase()));
  return row;
}

export async function insertSite(db: DbOrTx, values: SiteValues): Promise<SiteRow> {
  const [row] = await db.insert(sites).values(values).returning();
  if (!row) throw new Error('insert into sites returned no row');
  return row;
}

export async function updateSite(db: DbOrTx, id: string, values: Partial<SiteValues>): Promise<SiteRow | undefined> {
  const [row] = await db
    .update(sites)
    .set({ ...values, updatedAt: sql`now()` })
    .where(eq(sites.id, id))
    .returning();
  return row;
}
