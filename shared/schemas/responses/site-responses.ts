import { z } from 'zod';
import type { Site } from '../site';
import { batteryFieldsSchema, type Battery, type BatteryFields } from '../battery';
import { instant, uuid } from './common';
import type { SameType } from './same-type';

export const siteSchema = z
  .object({
    id: uuid,
    name: z.string(),
    timezone: z.string(),
    importLimitKw: z.number().nullable(),
    exportLimitKw: z.number().nullable(),
    demandChargePerKw: z.number().nullable(),
    currency: z.string(),
    defaultHorizonHours: z.number().int().nullable(),
    createdBy: z.string(),
    createdAt: instant,
    updatedAt: instant,
    batteryCount: z.number().int(),
    profileCount: z.number().int(),
  })
  .meta({ id: 'Site' });

const batteryField = z.enum(Object.keys(batteryFieldsSchema.shape) as [keyof BatteryFields, ...(keyof BatteryFields)[]]);

export const batteryResponseSchema = z
  .object({
    id: uuid,
    siteId: uuid,
    name: z.string(),
    powerChargeKw: z.number(),
    powerDischargeKw: z.number(),
    energyKwh: z.number(),
    socMinPct: z.number(),
    socMaxPct: z.number(),
    socInitialPct: z.number(),
    efficiencyCharge: z.number(),
    efficiencyDischarge: z.number(),
    selfDischargePctPerHour: z.number(),
    degradationCostPerMwh: z.number(),
    maxCyclesPerDay: z.number().nullable(),
    version: z.number().int(),
    createdBy: z.string(),
    createdAt: instant,
    updatedAt: instant,
    warnings: z.array(z.object({ field: batteryField.nullable(), message: z.string() })),
  })
  .meta({ id: 'Battery' });

export const siteMatches: SameType<z.infer<typeof siteSchema>, Site> = true;
export const batteryMatches: SameType<z.infer<typeof batteryResponseSchema>, Battery> = true;
