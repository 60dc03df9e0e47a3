/**
 * The quick horizon preview of a plan: `POST /api/plans/:id/horizon-preview
 * {horizonHours}` re-solves the plan's own stored inputs with another horizon on the
 * exact fast path and writes nothing. The range a preview may take is computed from
 * the inputs snapshot alone, so the page and the server agree on it.
 * Units: hours, % of nameplate energy; money in the site's currency.
 */
import { z } from 'zod';
import { horizonHoursSchema, type NetMoney, type PlanInputs } from './plan';

export const horizonPreviewRequestSchema = z.strictObject({ horizonHours: horizonHoursSchema });
export type HorizonPreviewRequest = z.infer<typeof horizonPreviewRequestSchema>;

/**
 * Most grid steps one preview may solve: a week of 5-minute steps (three weeks of
 * 15-minute, 84 days of hourly steps). Keeps one request well under a second, so
 * none can hold up the server; longer horizons are for a full plan.
 */
export const MAX_PREVIEW_STEPS = 2016;

/** Longest horizon any plan takes (one leap year), as horizonHoursSchema says. */
const MAX_HORIZON_HOURS = 8784;

export interface HorizonPreviewLimits {
  /** The delivery window's length: a horizon must cover it. */
  minHours: number;
  /** The shortest of: the data after the delivery start, one leap year, MAX_PREVIEW_STEPS steps. */
  maxHours: number;
  /** The grid step of the profiles: horizons are whole multiples of it. */
  stepHours: number;
  /** Which bound set maxHours, for the message when a horizon passes it. */
  maxReason: 'data' | 'year' | 'steps';
}

/** The horizons a preview of this snapshot accepts (the profiles' common period bounds the data). */
export function horizonPreviewLimits(
  inputs: Pick<PlanInputs, 'deliveryStart' | 'deliveryEnd' | 'profiles'>,
): HorizonPreviewLimits {
  const refs = [inputs.profiles.price, inputs.profiles.load, inputs.profiles.generation].filter((p) => p !== null);
  const stepMinutes = Math.min(...refs.map((p) => p.stepMinutes));
  const startMs = Date.parse(inputs.deliveryStart);
  const dataEndMs = Math.min(...refs.map((p) => Date.parse(p.end)));
  const bounds: [number, HorizonPreviewLimits['maxReason']][] = [
    [(dataEndMs - startMs) / 3_600_000, 'data'],
    [MAX_HORIZON_HOURS, 'year'],
    [(MAX_PREVIEW_STEPS * stepMinutes) / 60, 'steps'],
  ];
  const [maxHours, maxReason] = bounds.reduce((a, b) => (b[0] < a[0] ? b : a));
  return {
    minHours: (Date.parse(inputs.deliveryEnd) - startMs) / 3_600_000,
    maxHours,
    stepHours: stepMinutes / 60,
    maxReason,
  };
}

/** One step of the preview: SoC at the end of the step that starts at `time`. */
export interface HorizonPreviewStep {
  /** Start of the step, RFC 3339 UTC (as in the plan's steps). */
  time: string;
  delivery: boolean;
  socPct: number;
}

export interface HorizonPreview extends NetMoney {
  planId: string;
  horizonHours: number;
  /** Always the exact dynamic program: the preview has no other path. */
  method: 'dp';
  stepMinutes: number;
  deliverySteps: number;
  /** Money paid over the delivery window (negative = net earnings), as the plan's summary.cost. */
  cost: number;
  earnings: number;
  /** The plan's own summary.cost, when it has results, and cost − planCost. */
  planCost: number | null;
  costDifference: number | null;
  /** The plan's own summary.netCost (null for plans computed before net figures), and netCost − planNetCost: what "costs X more" ranks by. */
  planNetCost: number | null;
  netCostDifference: number | null;
  endSocPct: number;
  /** Delivery window first, then the lookahead. */
  steps: HorizonPreviewStep[];
  /** How far ahead prices matter for the delivery decisions, hours. */
  decisionHorizonHours: number | null;
  /** True when the decision horizon reaches the end of the lookahead (more data might lengthen it). */
  decisionHorizonLimitedByData: boolean;
  turnpike: {
    nearSteadyShare: number;
    entryArcSteps: number;
    leavingArcSteps: number;
    commitWindowSteps: number | null;
    flags: string[];
  };
  limits: HorizonPreviewLimits;
  /** Engine time for this preview, ms; serverMs adds reading the plan and (first time) its profiles. */
  computeMs: number;
  serverMs: number;
}
