import { z } from 'zod';
import { PLAN_EVENT_ACTIONS, PLAN_STATUSES, type PendingSignOff, type SignOffRecord } from '../sign-off';
import type { HorizonPreview } from '../horizon-preview';
import { instant, uuid } from './common';
import { storedEnergyValuationSchema } from './plan-responses';
import type { SameType } from './same-type';

const personAt = z.object({ id: z.string(), name: z.string().nullable(), email: z.string().nullable(), at: instant });
const decision = personAt.extend({ comment: z.string().nullable() });

export const signOffRecordSchema = z
  .object({
    planId: uuid,
    status: z.enum(PLAN_STATUSES),
    version: z.number().int(),
    created: personAt.nullable(),
    submitted: personAt.nullable(),
    approved: decision.nullable(),
    rejected: decision.nullable(),
    superseded: z.object({ at: instant, byPlanId: uuid }).nullable(),
    checksum: z.string().nullable(),
    checksumVerified: z.boolean().nullable(),
    copiedFrom: uuid.nullable(),
    events: z.array(
      z.object({
        id: z.number().int(),
        at: instant,
        action: z.enum(PLAN_EVENT_ACTIONS),
        actorId: z.string().nullable(),
        actorName: z.string().nullable(),
        actorEmail: z.string().nullable(),
        fromStatus: z.string().nullable(),
        toStatus: z.string().nullable(),
        version: z.number().int().nullable(),
        comment: z.string().nullable(),
        details: z.record(z.string(), z.unknown()),
      }),
    ),
    can: z.object({ submit: z.boolean(), approve: z.boolean(), reject: z.boolean(), copy: z.boolean(), export: z.boolean() }),
  })
  .meta({ id: 'SignOffRecord' });

/** `POST /api/plans/:id/approve` adds the plans its approval superseded. */
export const approvalRecordSchema = signOffRecordSchema
  .extend({ supersededPlanIds: z.array(uuid) })
  .meta({ id: 'ApprovalRecord' });

export const planCopySchema = z
  .object({ id: uuid, status: z.enum(PLAN_STATUSES), version: z.number().int(), copiedFrom: uuid.nullable() })
  .meta({ id: 'PlanCopy' });

const pendingSignOffSchema = z.object({
  planId: uuid,
  version: z.number().int(),
  siteId: uuid.nullable(),
  siteName: z.string().nullable(),
  batteryName: z.string().nullable(),
  deliveryStart: instant,
  deliveryEnd: instant,
  submittedAt: instant.nullable(),
  submittedBy: z.object({ id: z.string(), name: z.string().nullable(), email: z.string().nullable() }),
});

export const pendingSignOffListSchema = z.object({ plans: z.array(pendingSignOffSchema) }).meta({ id: 'PendingSignOffList' });

export const horizonPreviewSchema = z
  .object({
    planId: uuid,
    horizonHours: z.number(),
    method: z.literal('dp'),
    stepMinutes: z.number().int(),
    deliverySteps: z.number().int(),
    cost: z.number(),
    earnings: z.number(),
    planCost: z.number().nullable(),
    costDifference: z.number().nullable(),
    planNetCost: z.number().nullable(),
    netCostDifference: z.number().nullable(),
    storedEnergyChange: z.number(),
    netCost: z.number(),
    noBatteryCost: z.number(),
    batteryValue: z.number(),
    storedEnergyValuation: storedEnergyValuationSchema,
    endSocPct: z.number(),
    steps: z.array(z.object({ time: instant, delivery: z.boolean(), socPct: z.number() })),
    decisionHorizonHours: z.number().nullable(),
    decisionHorizonLimitedByData: z.boolean(),
    turnpike: z.object({
      nearSteadyShare: z.number(),
      entryArcSteps: z.number().int(),
      leavingArcSteps: z.number().int(),
      commitWindowSteps: z.number().int().nullable(),
      flags: z.array(z.string()),
    }),
    limits: z.object({
      minHours: z.number(),
      maxHours: z.number(),
      stepHours: z.number(),
      maxReason: z.enum(['data', 'year', 'steps']),
    }),
    computeMs: z.number(),
    serverMs: z.number(),
  })
  .meta({ id: 'HorizonPreview' });

export const signOffRecordMatches: SameType<z.infer<typeof signOffRecordSchema>, SignOffRecord> = true;
export const pendingSignOffMatches: SameType<z.infer<typeof pendingSignOffSchema>, PendingSignOff> = true;
export const horizonPreviewMatches: SameType<z.infer<typeof horizonPreviewSchema>, HorizonPreview> = true;
