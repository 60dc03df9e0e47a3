/**
 * Battery rules: omitted parameters take the lithium-ion defaults, the whole
 * battery is validated after every change (a PATCH is merged first), edits are
 * guarded by the version read, and warnings come from the shared rules.
 */
import {
  batterySchema,
  type Battery,
  type BatteryCreateInput,
  type BatteryFields,
  type BatteryPatch,
} from '@shared/schemas/battery';
import { withLithiumIonDefaults } from '@shared/schemas/battery-defaults';
import { batteryWarnings, type SiteLimits } from '@shared/schemas/battery-warnings';
import { recordAudit } from '../audit/audit.service';
import { getDb } from '../db/client';
import { conflict, notFound } from '../http/app-error';
import { withUniqueCheck } from '../db/pg-errors';
import type { Actor } from '../http/request-context';
import { requireSite } from '../sites/sites.service';
import type { BatteryRow } from './batteries.schema';
import * as repo from './batteries.repo';

function fieldsOf(row: BatteryRow): BatteryFields {
  return {
    name: row.name,
    powerChargeKw: row.powerChargeKw,
    powerDischargeKw: row.powerDischargeKw,
    energyKwh: row.energyKwh,
    socMinPct: row.socMinPct,
    socMaxPct: row.socMaxPct,
    socInitialPct: row.socInitialPct,
    efficiencyCharge: row.efficiencyCharge,
    efficiencyDischarge: row.efficiencyDischarge,
    selfDischargePctPerHour: row.selfDischargePctPerHour,
    degradationCostPerMwh: row.degradationCostPerMwh,
    maxCyclesPerDay: row.maxCyclesPerDay,
  };
}

function toBattery(row: BatteryRow, site: SiteLimits): Battery {
  const fields = fieldsOf(row);
  return {
    id: row.id,
    siteId: row.siteId,
    ...fields,
    version: row.version,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    warnings: batteryWarnings(fields, site),
  };
}

const duplicateName = (name: string | undefined) => () =>
  conflict(`This site already has a battery named "${name}". Choose another name.`);

export async function listSiteBatteries(siteId: string): Promise<Battery[]> {
  const db = getDb();
  const site = await requireSite(db, siteId);
  return (await repo.listBatteries(db, siteId)).map((row) => toBattery(row, site));
}

export async function getBattery(id: string): Promise<Battery> {
  const db = getDb();
  const row = await repo.findBattery(db, id);
  if (!row) throw notFound(`The battery ${id}`);
  return toBattery(row, await requireSite(db, row.siteId));
}

export async function createBattery(siteId: string, input: BatteryCreateInput, actor: Actor): Promise<Battery> {
  return withUniqueCheck(
    () =>
      getDb().transaction(async (tx) => {
        const site = await requireSite(tx, siteId);
        // Throws a ZodError (422 with the field's path) when the filled-in battery is inconsistent.
        const fields = batterySchema.parse(withLithiumIonDefaults(input));
        const row = await repo.insertBattery(tx, { ...fields, siteId, createdBy: actor.id });
        await recordAudit(tx, actor, {
          action: 'battery.create',
          entityType: 'battery',
          entityId: row.id,
          details: {
            siteId,
            ...fields,
            defaulted: Object.keys(fields).filter((k) => input[k as keyof BatteryCreateInput] === undefined),
          },
        });
        return toBattery(row, site);
      }),
    duplicateName(input.name),
  );
}

export async function updateBattery(id: string, patch: BatteryPatch, actor: Actor): Promise<Battery> {
  const { version, ...changes } = patch;
  return withUniqueCheck(
    () =>
      getDb().transaction(async (tx) => {
        const current = await repo.findBattery(tx, id);
        if (!current) throw notFound(`The battery ${id}`);
        if (current.version !== version) throw staleVersion(current.version, version);
        const merged = batterySchema.parse({ ...fieldsOf(current), ...changes });
        const row = await repo.updateBatteryAtVersion(tx, id, version, merged);
        // Someone saved between the read and the update (the UPDATE re-checks the version).
        if (!row) throw staleVersion(version + 1, version);
        const before = fieldsOf(current);
        const changed = Object.fromEntries(
          Object.entries(changes)
            .filter(([key, value]) => before[key as keyof BatteryFields] !== value)
            .map(([key, value]) => [key, { from: before[key as keyof BatteryFields], to: value }]),
        );
        await recordAudit(tx, actor, {
          action: 'battery.update',
          entityType: 'battery',
          entityId: id,
          details: { siteId: row.siteId, version: row.version, changes: changed },
        });
        return toBattery(row, await requireSite(tx, row.siteId));
      }),
    duplicateName(changes.name),
  );
}

function staleVersion(current: number, sent: number) {
  return conflict(
    `This battery was changed by someone else since you opened it (you sent version ${sent}, it is now at ${current} or later). Reload it and apply your change again.`,
  );
}
