import { z } from 'zod';
import { planStatuses, type Plan, type PlanCreated, type PlanDefaults, type PlanInputs, type PlanResults } from '../plan';
import { steadyDaysValues } from '../steady-days';
import { instant, orNull, uuid } from './common';
import { jobProgressSchema } from './job-responses';
import type { SameType } from './same-type';

export const terminalRuleTextSchema = z.union([
  z.enum(['free', 'cyclic', 'steady-value']),
  z.templateLiteral(['target:', z.number()]),
]);

export const batterySnapshotSchema = z
  .object({
    id: uuid,
    name: z.string(),
    version: z.number().int(),
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
  })
  .meta({ id: 'BatterySnapshot' });

export const siteSnapshotSchema = z
  .object({
    id: uuid,
    name: z.string(),
    timezone: z.string(),
    currency: z.string(),
    importLimitKw: z.number().nullable(),
    exportLimitKw: z.number().nullable(),
    demandChargePerKw: z.number().nullable(),
  })
  .meta({ id: 'SiteSnapshot' });

export const profileRefSchema = z
  .object({
    id: uuid,
    name: z.string(),
    kind: z.enum(['price', 'load', 'generation']),
    start: instant,
    end: instant,
    stepMinutes: z.number().int(),
    sha256: z.string(),
  })
  .meta({ id: 'ProfileRef' });

export const initialSocSourceSchema = z.enum(['request', 'last-approved-plan', 'battery']);

export const runProfilesSchema = z.object({
  price: profileRefSchema,
  load: orNull(profileRefSchema),
  generation: orNull(profileRefSchema),
});

export const planInputsSchema = z
  .object({
    battery: batterySnapshotSchema,
    site: siteSnapshotSchema,
    profiles: runProfilesSchema,
    deliveryStart: instant,
    deliveryEnd: instant,
    horizonHours: z.number(),
    terminalRule: terminalRuleTextSchema,
    initialSocPct: z.number(),
    initialSocSource: initialSocSourceSchema,
    initialSocPlanId: uuid.nullable(),
    bandPct: z.number(),
    steadyDays: z.enum(steadyDaysValues).optional(),
    warnings: z.array(z.string()),
  })
  .meta({ id: 'PlanInputs' });

export const storedEnergyValuationSchema = z
  .object({
    valued: z.boolean(),
    startValuePerMwh: z.number().nullable(),
    endValuePerMwh: z.number().nullable(),
    startClock: z.string(),
    endClock: z.string(),
    startEnergyKwh: z.number(),
    endEnergyKwh: z.number(),
    description: z.string(),
  })
  .meta({ id: 'StoredEnergyValuation' });

const planStepSchema = z.object({
  time: instant,
  delivery: z.boolean(),
  priceImport: z.number(),
  priceExport: z.number(),
  chargeKw: z.number(),
  dischargeKw: z.number(),
  gridImportKw: z.number(),
  gridExportKw: z.number(),
  socKwh: z.number(),
  socPct: z.number(),
  storedEnergyValue: z.number().nullable(),
  steadySocKwh: z.number().nullable(),
  steadyValue: z.number().nullable(),
  distance: z.number().nullable(),
  arc: z.enum(['entry', 'near', 'leaving', 'outside']),
});

export const planResultsSchema = z
  .object({
    method: z.enum(['dp', 'lp']),
    stepMinutes: z.number().int(),
    deliverySteps: z.number().int(),
    steps: z.array(planStepSchema),
    summary: z.object({
      cost: z.number(),
      earnings: z.number(),
      equivalentCycles: z.number(),
      peakImportKw: z.number(),
      chargedKwh: z.number(),
      dischargedKwh: z.number(),
      endSocPct: z.number(),
      simultaneousSteps: z.number().int(),
      storedEnergyChange: z.number().optional(),
      netCost: z.number().optional(),
      noBatteryCost: z.number().optional(),
      batteryValue: z.number().optional(),
      storedEnergyValuation: storedEnergyValuationSchema.optional(),
    }),
    turnpike: z.object({
      bandPct: z.number(),
      bandKwh: z.number(),
      nearSteadyShare: z.number(),
      entryArcSteps: z.number().int(),
      leavingArcSteps: z.number().int(),
      excursions: z
        .object({ count: z.number().int(), steps: z.number().int(), largestDistance: z.number() })
        .optional()
        .meta({ description: 'Absent in plans computed before excursions were counted.' }),
      commitWindowSteps: z.number().int().nullable(),
      longerLookaheadHours: z.number().nullable(),
      value: z.object({
        bandPerMwh: z.number(),
        nearSteadyShare: z.number(),
        entryArcSteps: z.number().int(),
        leavingArcSteps: z.number().int(),
        commitWindowSteps: z.number().int().nullable(),
      }),
      flags: z.array(z.string()),
      summary: z.string(),
    }),
    steadyCycle: z.object({ costPerDay: z.number(), equivalentCyclesPerDay: z.number() }).nullable(),
    decisionHorizonHours: z.number().nullable(),
    valueCurves: z.array(z.object({ time: instant, points: z.array(z.object({ socPct: z.number(), value: z.number() })) })),
    notes: z.array(z.string()),
    solveSeconds: z.number(),
  })
  .meta({ id: 'PlanResults' });

const person = z.object({ id: z.string(), name: z.string().nullable() });

export const planSchema = z
  .object({
    id: uuid,
    siteId: uuid,
    siteName: z.string().nullable(),
    batteryId: uuid,
    batteryName: z.string().nullable(),
    priceProfileId: uuid,
    loadProfileId: uuid.nullable(),
    generationProfileId: uuid.nullable(),
    deliveryStart: instant,
    deliveryEnd: instant,
    horizonHours: z.number(),
    terminalRule: z.string(),
    initialSocPct: z.number(),
    status: z.enum(planStatuses),
    version: z.number().int(),
    inputVersion: z.number().int(),
    createdBy: person,
    createdAt: instant,
    submittedAt: instant.nullable(),
    approvedAt: instant.nullable(),
    method: z.enum(['dp', 'lp']).nullable(),
    errorMessage: z.string().nullable(),
    job: orNull(jobProgressSchema),
    inputs: planInputsSchema.optional().meta({ description: 'Only in GET /api/plans/:id.' }),
    results: planResultsSchema.nullable().optional().meta({ description: 'Only in GET /api/plans/:id; null until computed.' }),
    headline: z
      .object({ cost: z.number(), earnings: z.number(), nearSteadyShare: z.number(), flags: z.number().int() })
      .nullable()
      .optional()
      .meta({ description: 'In lists: the headline figures without the series.' }),
  })
  .meta({ id: 'Plan' });

export const planCreatedSchema = z.object({ plan: planSchema, job: jobProgressSchema }).meta({ id: 'PlanCreated' });

export const planDefaultsSchema = z
  .object({
    batteryId: uuid,
    initialSocPct: z.number(),
    initialSocSource: initialSocSourceSchema,
    initialSocPlanId: uuid.nullable(),
    defaultHorizonHours: z.number().nullable(),
  })
  .meta({ id: 'PlanDefaults' });

export const planInputsMatches: SameType<z.infer<typeof planInputsSchema>, PlanInputs> = true;
export const planResultsMatches: SameType<z.infer<typeof planResultsSchema>, PlanResults> = true;
export const planMatches: SameType<z.infer<typeof planSchema>, Plan> = true;
export const planCreatedMatches: SameType<z.infer<typeof planCreatedSchema>, PlanCreated> = true;
export const planDefaultsMatches: SameType<z.infer<typeof planDefaultsSchema>, PlanDefaults> = true;
