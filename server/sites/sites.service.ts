/** Site rules: unique names, audit on every change, one transaction per change. */
import type { Site, SiteFields, SitePatch } from '@shared/schemas/site';
import { recordAudit } from '../audit/audit.service';
import { getDb, type DbOrTx } from '../db/client';
import { conflict, notFound } from '../http/app-error';
import { withUniqueCheck } from '../db/pg-errors';
import type { Actor } from '../http/request-context';
import * as repo from './sites.repo';

function toSite(row: repo.SiteWithCounts): Site {
  return {
    id: row.id,
    name: row.name,
    timezone: row.timezone,
    importLimitKw: row.importLimitKw,
    exportLimitKw: row.exportLimitKw,
    demandChargePerKw: row.demandChargePerKw,
    currency: row.currency,
    defaultHorizonHours: row.defaultHorizonHours,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    batteryCount: row.batteryCount,
    profileCount: row.profileCount,
  };
}

const duplicateName = (name: string | undefined) => () =>
  conflict(`A site named "${name}" already exists. Choose another name, or open the existing site.`);

export async function listSites(): Promise<Site[]> {
  return (await repo.listSites(getDb())).map(toSite);
}

/** The site row, or a 404 naming the id. Other modules use it to check a site exists. */
export async function requireSite(db: DbOrTx, id: string): Promise<repo.SiteWithCounts> {
  const row = await repo.findSite(db, id);
  if (!row) throw notFound(`The site ${id}`);
  return row;
}

export async function getSite(id: string): Promise<Site> {
  return toSite(await requireSite(getDb(), id));
}

export async function createSite(fields: SiteFields, actor: Actor): Promise<Site> {
  const id = await withUniqueCheck(
    () =>
      getDb().transaction(async (tx) => {
        const row = await repo.insertSite(tx, { ...fields, createdBy: actor.id });
        await recordAudit(tx, actor, {
          action: 'site.create',
          entityType: 'site',
          entityId: row.id,
          details: { ...fields },
        });
        return row.id;
      }),
    duplicateName(fields.name),
  );
  return getSite(id);
}

export async function updateSite(id: string, patch: SitePatch, actor: Actor): Promise<Site> {
  await withUniqueCheck(
    () =>
      getDb().transaction(async (tx) => {
        const before = await requireSite(tx, id);
        const row = await repo.updateSite(tx, id, patch);
        if (!row) throw notFound(`The site ${id}`);
        const changes = Object.fromEntries(
          Object.entries(patch).map(([key, value]) => [key, { from: before[key as keyof SitePatch], to: value }]),
        );
        await recordAudit(tx, actor, {
          action: 'site.update',
          entityType: 'site',
          entityId: id,
          details: { changes },
        });
      }),
    duplicateName(patch.name),
  );
  return getSite(id);
}
