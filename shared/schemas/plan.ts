/**
 * Plans: the request of `POST /api/plans`, the list
 * filters, the inputs snapshot and the results the job stores. Units: kW, kWh,
 * hours, % of nameplate energy; money in the site's currency, prices per MWh.
 */
import { z } from 'zod';
import type { JobProgress } from './job';
import { terminalRuleSchema, type TerminalRuleText } from './terminal-rule';
import { steadyDaysSchema, type SteadyDays } from './steady-days';

export const planStatuses = ['draft', 'submitted', 'approved', 'rejected', 'superseded'] as const;
export type PlanStatusName = (typeof planStatuses)[number];

const instant = (field: string) =>
  z.iso
    .datetime({ offset: true, error: `Give ${field} as an RFC 3339 time with offset, e.g. 2026-03-02T00:00:00+01:00.` })
    .transform((text) => new Date(text));

const id = (what: string) => z.uuid({ error: `The ${what} id is not a valid id.` });

/** Hours: positive, at most one leap year (the longest profile we keep). */
export const horizonHoursSchema = z
  .number({ error: 'Give the horizon in hours, e.g. 48.' })
  .gt(0, 'The horizon must be longer than 0 hours.')
  .max(8784, 'The horizon is at most 8784 hours (one year).');

export const socPctSchema = z
  .number({ error: 'Give the SoC in % of nameplate energy.' })
  .min(0, 'The SoC is at least 0 %.')
  .max(100, 'The SoC is at most 100 %.');

export const planCreateSchema = z
  .strictObject({
    batteryId: id('battery'),
    priceProfileId: id('price profile'),
    loadProfileId: id('load profile').nullish(),
    generationProfileId: id('generation profile').nullish(),
    deliveryStart: instant('deliveryStart'),
    deliveryEnd: instant('deliveryEnd'),
    horizonHours: horizonHoursSchema,
    terminalRule: terminalRuleSchema,
    initialSocPct: socPctSchema.nullish(),
    steadyDays: steadyDaysSchema.optional(),
  })
  .superRefine((body, ctx) => {
    const windowHours = (body.deliveryEnd.getTime() - body.deliveryStart.getTime()) / 3_600_000;
    if (windowHours <= 0) {
      ctx.addIssue({ code: 'custom', path: ['deliveryEnd'], message: 'The delivery window must end after it starts.' });
    } else if (body.horizonHours < windowHours - 1e-9) {
      ctx.addIssue({
        code: 'custom',
        path: ['horizonHours'],
        message: `The horizon (${body.horizonHours} h) is shorter than the delivery window (${windowHours} h): it must at least cover the window.`,
      });
    }
  });
export type PlanCreateInput = z.input<typeof planCreateSchema>;
export type PlanCreate = z.infer<typeof planCreateSchema>;

export const planListQuerySchema = z.strictObject({
  siteId: id('site').optional(),
  batteryId: id('battery').optional(),
  status: z.enum(planStatuses, { error: `Use one of ${planStatuses.join(', ')}.` }).optional(),
  jobState: z.enum(['queued', 'running', 'retrying', 'completed', 'failed', 'active']).optional(),
  /** Only plans whose delivery window is exactly this one (plan comparison by horizon). */
  deliveryStart: instant('deliveryStart').optional(),
  deliveryEnd: instant('deliveryEnd').optional(),
  /** Only plans with turnpike flags (the home page's "needs attention"). */
  flagged: z.enum(['true', 'false']).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type PlanListQuery = z.infer<typeof planListQuerySchema>;

/** Battery parameters copied into a snapshot (the engine's battery keys). */
export interface BatterySnapshot {
  id: string;
  name: string;
  version: number;
  powerChargeKw: number;
  powerDischargeKw: number;
  energyKwh: number;
  socMinPct: number;
  socMaxPct: number;
  socInitialPct: number;
  efficiencyCharge: number;
  efficiencyDischarge: number;
  selfDischargePctPerHour: number;
  degradationCostPerMwh: number;
  maxCyclesPerDay: number | null;
}

export interface SiteSnapshot {
  id: string;
  name: string;
  timezone: string;
  currency: string;
  importLimitKw: number | null;
  exportLimitKw: number | null;
  demandChargePerKw: number | null;
}

/** A profile named by id and content hash; its values are read when the job runs (profiles never change). */
export interface ProfileRef {
  id: string;
  name: string;
  kind: 'price' | 'load' | 'generation';
  start: string;
  end: string;
  stepMinutes: number;
  sha256: string;
}

export type InitialSocSource = 'request' | 'last-approved-plan' | 'battery';

export interface PlanInputs {
  battery: BatterySnapshot;
  site: SiteSnapshot;
  profiles: { price: ProfileRef; load: ProfileRef | null; generation: ProfileRef | null };
  deliveryStart: string;
  deliveryEnd: string;
  horizonHours: number;
  terminalRule: TerminalRuleText;
  initialSocPct: number;
  initialSocSource: InitialSocSource;
  /** When the SoC came from an earlier plan, which one. */
  initialSocPlanId: string | null;
  /** Tolerance band around the steady cycle, % of usable energy. */
  bandPct: number;
  /** Days the steady cycle averages; absent in plans made before the choice existed (then all). */
  steadyDays?: SteadyDays;
  /** Warnings on settings outside common practice (docs/model.md), at creation time. */
  warnings: string[];
}

/** One step of a plan, delivery window first, then the lookahead. */
export interface PlanStep {
  /** Start of the step, RFC 3339 UTC. */
  time: string;
  /** True inside the delivery window; false for the lookahead beyond it. */
  delivery: boolean;
  priceImport: number;
  priceExport: number;
  chargeKw: number;
  dischargeKw: number;
  gridImportKw: number;
  gridExportKw: number;
  /** Energy at the end of the step, kWh, and as % of nameplate. */
  socKwh: number;
  socPct: number;
  /** Value of one more MWh stored at the end of the step, currency/MWh. */
  storedEnergyValue: number | null;
  /** The steady cycle at the same time of day: SoC (kWh) and stored-energy value. */
  steadySocKwh: number | null;
  steadyValue: number | null;
  /** |SoC − steady SoC| / usable energy, as a fraction. */
  distance: number | null;
  /** Which arc the step belongs to: before the band, near it, or after leaving it. */
  arc: 'entry' | 'near' | 'leaving' | 'outside';
}

/** How stored energy was valued (the steady cycle's value per MWh at the window's start and end clock times). */
export interface StoredEnergyValuation {
  valued: boolean;
  /** Currency/MWh; null when stored energy is not valued. */
  startValuePerMwh: number | null;
  endValuePerMwh: number | null;
  /** Local clock times, HH:MM. */
  startClock: string;
  endClock: string;
  startEnergyKwh: number;
  endEnergyKwh: number;
  /** One line for the screens. */
  description: string;
}

/** Net figures of a window: cash cost with the change in stored energy's value taken off. */
export interface NetMoney {
  /** Change in the value of the energy in the battery over the window (currency). */
  storedEnergyChange: number;
  /** cost − storedEnergyChange: what comparisons rank by. */
  netCost: number;
  /** The same site, window and prices without the battery. */
  noBatteryCost: number;
  /** noBatteryCost − netCost. */
  batteryValue: number;
  storedEnergyValuation: StoredEnergyValuation;
}

export interface PlanSummary {
  /** Money paid over the delivery window incl. degradation and demand charge (negative = net earnings). */
  cost: number;
  /** Money the battery earns over the window: cost without the battery minus cost with it. */
  earnings: number;
  equivalentCycles: number;
  peakImportKw: number;
  chargedKwh: number;
  dischargedKwh: number;
  endSocPct: number;
  /** Steps that charge and discharge at once (only pays at negative prices). */
  simultaneousSteps: number;
  /** Net figures; absent in plans computed before they existed. */
  storedEnergyChange?: number;
  netCost?: number;
  noBatteryCost?: number;
  batteryValue?: number;
  storedEnergyValuation?: StoredEnergyValuation;
}

/** Stretches outside the band between the entry and the leaving arc (distances as fractions of usable energy). */
export interface PlanExcursions {
  count: number;
  steps: number;
  largestDistance: number;
}

export interface PlanTurnpike {
  /** Tolerance band around the steady cycle, % of usable energy, and the same in kWh. */
  bandPct: number;
  bandKwh: number;
  /** Share of the plan's steps whose SoC is inside the band, 0–1. */
  nearSteadyShare: number;
  entryArcSteps: number;
  leavingArcSteps: number;
  /** Absent in plans computed before excursions were counted. */
  excursions?: PlanExcursions;
  /** Leading steps that agree with a plan of a much longer lookahead; null when none could be solved. */
  commitWindowSteps: number | null;
  /** Hours of that longer lookahead, or null. */
  longerLookaheadHours: number | null;
  /** The same figures for the stored-energy value against its steady value (compared where SoC is strictly inside its window). */
  value: {
    bandPerMwh: number;
    nearSteadyShare: number;
    entryArcSteps: number;
    leavingArcSteps: number;
    commitWindowSteps: number | null;
  };
  /** Findings a planner can act on, in plain words. */
  flags: string[];
  /** The figures in plain sentences for the plan page. */
  summary: string;
}

export interface PlanResults {
  method: 'dp' | 'lp';
  stepMinutes: number;
  deliverySteps: number;
  steps: PlanStep[];
  summary: PlanSummary;
  turnpike: PlanTurnpike;
  steadyCycle: { costPerDay: number; equivalentCyclesPerDay: number } | null;
  /** How far ahead prices matter for the first decisions (exact path only), hours. */
  decisionHorizonHours: number | null;
  /** Stored-energy value against SoC at chosen times (exact path only). */
  valueCurves: { time: string; points: { socPct: number; value: number }[] }[];
  notes: string[];
  solveSeconds: number;
}

export interface PlanPerson {
  id: string;
  name: string | null;
}

export interface Plan {
  id: string;
  siteId: string;
  siteName: string | null;
  batteryId: string;
  batteryName: string | null;
  priceProfileId: string;
  loadProfileId: string | null;
  generationProfileId: string | null;
  deliveryStart: string;
  deliveryEnd: string;
  horizonHours: number;
  terminalRule: string;
  initialSocPct: number;
  status: PlanStatusName;
  version: number;
  inputVersion: number;
  createdBy: PlanPerson;
  createdAt: string;
  submittedAt: string | null;
  approvedAt: string | null;
  method: 'dp' | 'lp' | null;
  errorMessage: string | null;
  job: JobProgress | null;
  /** Only in `GET /api/plans/:id`. */
  inputs?: PlanInputs;
  results?: PlanResults | null;
  /** In lists: the headline figures without the series. */
  headline?: { cost: number; earnings: number; nearSteadyShare: number; flags: number } | null;
}

export interface PlanCreated {
  plan: Plan;
  job: JobProgress;
}

/** `GET /api/batteries/:id/plan-defaults`: what the plan form proposes. */
export interface PlanDefaults {
  batteryId: string;
  initialSocPct: number;
  initialSocSource: InitialSocSource;
  initialSocPlanId: string | null;
  defaultHorizonHours: number | null;
}
