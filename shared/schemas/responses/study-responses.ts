import { z } from 'zod';
import { jobStates } from '../job';
import { steadyDaysValues } from '../steady-days';
import type { Study, StudyCreated, StudyInputs, StudyResults } from '../study';
import { instant, orNull, uuid } from './common';
import { jobProgressSchema } from './job-responses';
import {
  batterySnapshotSchema,
  initialSocSourceSchema,
  runProfilesSchema,
  siteSnapshotSchema,
  storedEnergyValuationSchema,
  terminalRuleTextSchema,
} from './plan-responses';
import type { SameType } from './same-type';

const method = z.enum(['dp', 'lp', 'mixed']);

export const studyInputsSchema = z
  .object({
    battery: batterySnapshotSchema,
    site: siteSnapshotSchema,
    profiles: runProfilesSchema,
    start: instant,
    end: instant,
    horizonsHours: z.array(z.number()),
    replanHours: z.number(),
    terminalRules: z.array(terminalRuleTextSchema),
    initialSocPct: z.number(),
    initialSocSource: initialSocSourceSchema,
    bandPct: z.number(),
    steadyDays: z.enum(steadyDaysValues).optional(),
    warnings: z.array(z.string()),
  })
  .meta({ id: 'StudyInputs' });

const recommendationSchema = z
  .object({ horizonHours: z.number().nullable(), terminal: z.string().nullable(), reason: z.string() })
  .meta({ id: 'StudyRecommendation' });

export const studyResultsSchema = z
  .object({
    method,
    referenceCost: z.number(),
    referenceNetCost: z.number().optional(),
    referenceBatteryValue: z.number().optional(),
    noBatteryCost: z.number().optional(),
    storedEnergyValuation: storedEnergyValuationSchema.optional(),
    referenceEquivalentCycles: z.number(),
    steps: z.number().int(),
    stepMinutes: z.number().int(),
    runs: z.array(
      z.object({
        horizonHours: z.number(),
        terminal: z.string(),
        status: z.enum(['optimal', 'infeasible', 'unbounded', 'error']),
        message: z.string().nullable(),
        cost: z.number().nullable(),
        gapPct: z.number().nullable(),
        equivalentCycles: z.number(),
        solves: z.number().int(),
        seconds: z.number(),
        nearSteadyShare: z.number(),
        meanLeavingArcSteps: z.number(),
        leavingIntoCommitted: z.number().int(),
        method,
        storedEnergyChange: z.number().nullable().optional(),
        netCost: z.number().nullable().optional(),
        noBatteryCost: z.number().nullable().optional(),
        batteryValue: z.number().nullable().optional(),
        gapValue: z.number().nullable().optional(),
        valueGapPct: z.number().nullable().optional(),
      }),
    ),
    recommendation: orNull(recommendationSchema),
    targetGapPct: z.number(),
    notes: z.array(z.string()),
    seconds: z.number(),
  })
  .meta({ id: 'StudyResults' });

export const studySchema = z
  .object({
    id: uuid,
    siteId: uuid,
    siteName: z.string().nullable(),
    batteryId: uuid,
    batteryName: z.string().nullable(),
    start: instant,
    end: instant,
    horizonsHours: z.array(z.number()),
    replanHours: z.number(),
    terminalRules: z.array(z.string()),
    initialSocPct: z.number(),
    createdBy: z.object({ id: z.string(), name: z.string().nullable() }),
    createdAt: instant,
    status: z.enum(jobStates),
    method: method.nullable(),
    errorMessage: z.string().nullable(),
    job: orNull(jobProgressSchema),
    inputs: studyInputsSchema.optional().meta({ description: 'Only in GET /api/studies/:id.' }),
    results: studyResultsSchema.nullable().optional().meta({ description: 'Only in GET /api/studies/:id.' }),
    recommendation: recommendationSchema
      .nullable()
      .optional()
      .meta({ description: 'In lists: the recommendation without the runs.' }),
  })
  .meta({ id: 'Study' });

export const studyCreatedSchema = z.object({ study: studySchema, job: jobProgressSchema }).meta({ id: 'StudyCreated' });

export const studyInputsMatches: SameType<z.infer<typeof studyInputsSchema>, StudyInputs> = true;
export const studyResultsMatches: SameType<z.infer<typeof studyResultsSchema>, StudyResults> = true;
export const studyMatches: SameType<z.infer<typeof studySchema>, Study> = true;
export const studyCreatedMatches: SameType<z.infer<typeof studyCreatedSchema>, StudyCreated> = true;
