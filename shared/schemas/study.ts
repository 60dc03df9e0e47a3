/**
 * Horizon studies: receding-horizon runs over a
 * period for several horizons and terminal rules, each compared with the
 * reference path over the same period from the same initial SoC.
 */
import { z } from 'zod';
import type { JobProgress, JobState } from './job';
import type { BatterySnapshot, InitialSocSource, ProfileRef, SiteSnapshot, StoredEnergyValuation } from './plan';
import { horizonHoursSchema, socPctSchema } from './plan';
import { terminalRuleSchema, type TerminalRuleText } from './terminal-rule';
import { steadyDaysSchema, type SteadyDays } from './steady-days';

const instant = (field: string) =>
  z.iso
    .datetime({ offset: true, error: `Give ${field} as an RFC 3339 time with offset, e.g. 2026-03-01T00:00:00+01:00.` })
    .transform((text) => new Date(text));

const id = (what: string) => z.uuid({ error: `The ${what} id is not a valid id.` });

export const studyCreateSchema = z
  .strictObject({
    batteryId: id('battery'),
    priceProfileId: id('price profile'),
    loadProfileId: id('load profile').nullish(),
    generationProfileId: id('generation profile').nullish(),
    start: instant('start'),
    end: instant('end'),
    horizonsHours: z
      .array(horizonHoursSchema, { error: 'Give the horizons as a list of hours, e.g. [6, 12, 24, 48].' })
      .min(1, 'Give at least one horizon.')
      .max(12, 'At most 12 horizons per study.'),
    replanHours: z
      .number({ error: 'Give the re-plan interval in hours, e.g. 1.' })
      .gt(0, 'The re-plan interval must be longer than 0 hours.')
      .max(168, 'Re-plan at least once a week (168 h).'),
    terminalRules: z
      .array(terminalRuleSchema, { error: 'Give the terminal rules as a list, e.g. ["free", "steady-value"].' })
      .min(1, 'Give at least one terminal rule.')
      .max(4, 'At most 4 terminal rules per study.'),
    initialSocPct: socPctSchema.nullish(),
    /** Days the steady cycle of the steady-value rule averages. */
    steadyDays: steadyDaysSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (body.end.getTime() <= body.start.getTime()) {
      ctx.addIssue({ code: 'custom', path: ['end'], message: 'The study period must end after it starts.' });
    }
    body.horizonsHours.forEach((h, i) => {
      if (h < body.replanHours) {
        ctx.addIssue({
          code: 'custom',
          path: ['horizonsHours', i],
          message: `The horizon of ${h} h is shorter than the re-plan interval of ${body.replanHours} h: every plan must reach the next re-plan. Lengthen the horizon or re-plan more often.`,
        });
      }
    });
    if (new Set(body.horizonsHours).size !== body.horizonsHours.length) {
      ctx.addIssue({ code: 'custom', path: ['horizonsHours'], message: 'Each horizon may appear only once.' });
    }
    if (new Set(body.terminalRules).size !== body.terminalRules.length) {
      ctx.addIssue({ code: 'custom', path: ['terminalRules'], message: 'Each terminal rule may appear only once.' });
    }
  });
export type StudyCreateInput = z.input<typeof studyCreateSchema>;
export type StudyCreate = z.infer<typeof studyCreateSchema>;

export const studyListQuerySchema = z.strictObject({
  siteId: id('site').optional(),
  batteryId: id('battery').optional(),
  status: z.enum(['queued', 'running', 'retrying', 'completed', 'failed', 'active']).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type StudyListQuery = z.infer<typeof studyListQuerySchema>;

export interface StudyInputs {
  battery: BatterySnapshot;
  site: SiteSnapshot;
  profiles: { price: ProfileRef; load: ProfileRef | null; generation: ProfileRef | null };
  start: string;
  end: string;
  horizonsHours: number[];
  replanHours: number;
  terminalRules: TerminalRuleText[];
  initialSocPct: number;
  initialSocSource: InitialSocSource;
  bandPct: number;
  /** Days the steady cycle averages; absent in studies made before the choice existed (then all). */
  steadyDays?: SteadyDays;
  warnings: string[];
}

export interface StudyRun {
  horizonHours: number;
  terminal: string;
  /** `optimal` when every window solved; otherwise `message` names the first that did not. */
  status: 'optimal' | 'infeasible' | 'unbounded' | 'error';
  message: string | null;
  /** Realised cost over the period (money paid; negative = earnings); null when the run failed. */
  cost: number | null;
  /** (cost − reference cost) / |reference cost| in %; null when the run failed. */
  gapPct: number | null;
  equivalentCycles: number;
  solves: number;
  seconds: number;
  nearSteadyShare: number;
  meanLeavingArcSteps: number;
  /** Open-loop plans whose leaving arc reached into the steps they commit. */
  leavingIntoCommitted: number;
  method: 'dp' | 'lp' | 'mixed';
  /** Net figures (stored energy valued as for the reference path); null when the run failed, absent in older studies. */
  storedEnergyChange?: number | null;
  netCost?: number | null;
  noBatteryCost?: number | null;
  batteryValue?: number | null;
  /** netCost − referenceNetCost, currency, and the same in % of the reference path's battery value. */
  gapValue?: number | null;
  valueGapPct?: number | null;
}

export interface StudyRecommendation {
  /** Null when no run finished. */
  horizonHours: number | null;
  terminal: string | null;
  reason: string;
}

export interface StudyResults {
  method: 'dp' | 'lp' | 'mixed';
  referenceCost: number;
  /** The reference path's net cost and battery value, the site without a battery, how stored energy was valued; absent in older studies. */
  referenceNetCost?: number;
  referenceBatteryValue?: number;
  noBatteryCost?: number;
  storedEnergyValuation?: StoredEnergyValuation;
  referenceEquivalentCycles: number;
  steps: number;
  stepMinutes: number;
  runs: StudyRun[];
  recommendation: StudyRecommendation | null;
  targetGapPct: number;
  notes: string[];
  seconds: number;
}

export interface Study {
  id: string;
  siteId: string;
  siteName: string | null;
  batteryId: string;
  batteryName: string | null;
  start: string;
  end: string;
  horizonsHours: number[];
  replanHours: number;
  terminalRules: string[];
  initialSocPct: number;
  createdBy: { id: string; name: string | null };
  createdAt: string;
  /** The job's state: the study's status. */
  status: JobState;
  method: 'dp' | 'lp' | 'mixed' | null;
  errorMessage: string | null;
  job: JobProgress | null;
  inputs?: StudyInputs;
  results?: StudyResults | null;
  /** In lists: the recommendation without the runs. */
  recommendation?: StudyRecommendation | null;
}

export interface StudyCreated {
  study: Study;
  job: JobProgress;
}
