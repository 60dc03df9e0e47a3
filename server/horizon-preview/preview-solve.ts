/**
 * The preview's engine work: the plan's own request (delivery window, terminal
 * rule, initial SoC, band) with another horizon, solved exactly as the plan job
 * would solve it, but on the exact dynamic program only. Pure: no database.
 */
import type { HorizonPreview, HorizonPreviewStep } from '@shared/schemas/horizon-preview';
import type { PlanInputs } from '@shared/schemas/plan';
import {
  canSolveWithDp,
  parseTerminal,
  problemFor,
  solvePlan,
  stepIndexOf,
  type AlignedInputs,
  type DpEligibility,
  type SteadyCycle,
} from '../engine';
import { AppError } from '../http/app-error';
import { summarisePlan } from '../plans/insights/plan-summary';
import { netMoney } from '../runs/net-money';

export const hours = (h: number) => `${Number(h.toFixed(4))} h`;

/**
 * Whether the dynamic program takes the plan's model over the window the
 * horizon spans (an export price above the import price anywhere in it would
 * make the stage cost non-convex). The terminal rule never matters for this.
 */
export function previewEligibility(a: AlignedInputs, inputs: PlanInputs, horizonHours: number): DpEligibility {
  const start = stepIndexOf(a, Date.parse(inputs.deliveryStart), 'the delivery start');
  if (!start.ok) return { ok: false, reason: start.message };
  const end = Math.min(a.timesMs.length, start.index + Math.round((horizonHours * 60) / a.stepMinutes));
  return canSolveWithDp(problemFor(a, start.index, end, 0, { kind: 'free' }));
}

/** Why the preview cannot run, in the planner's words, with what to do instead. */
export function needsExactPath(reason: string): AppError {
  const why = reason.replace(/; the LP path solves it$/, '');
  return new AppError(
    'preview_needs_exact_path',
    `The quick horizon preview needs the exact fast path, and this plan’s model is one it cannot solve exactly: ${why}. ` +
      'Make a full plan with the horizon you want instead: it runs in the background on the linear program.',
    422,
    [{ path: 'model', message: why }],
    { previewAvailable: false },
  );
}

export type PreviewFigures = Omit<
  HorizonPreview,
  'planId' | 'planCost' | 'costDifference' | 'planNetCost' | 'netCostDifference' | 'limits' | 'serverMs'
>;

export type PreviewOutcome = { ok: true; preview: PreviewFigures } | { ok: false; message: string };

export function solvePreview(a: AlignedInputs, steady: SteadyCycle, inputs: PlanInputs, horizonHours: number): PreviewOutcome {
  const started = performance.now();
  const terminal = parseTerminal(inputs.terminalRule);
  if (!terminal.ok) return { ok: false, message: terminal.message };
  const outcome = solvePlan(a, {
    startMs: Date.parse(inputs.deliveryStart),
    endMs: Date.parse(inputs.deliveryEnd),
    horizonHours,
    terminal: terminal.choice,
    initialSocPct: inputs.initialSocPct,
    bandFraction: inputs.bandPct / 100,
    method: 'dp',
    steady,
  });
  if (!outcome.ok) return { ok: false, message: outcome.issue.message };
  const { plan } = outcome;
  const sol = plan.solution;
  const deliverySteps = plan.to - plan.from;
  const steps: HorizonPreviewStep[] = sol.chargeKw.map((_, t) => ({
    time: new Date(a.timesMs[plan.from + t]!).toISOString(),
    delivery: t < deliverySteps,
    socPct: (sol.socKwh[t + 1]! / a.battery.energyKwh) * 100,
  }));
  const summary = summarisePlan(a, plan.from, deliverySteps, sol);
  const tp = plan.turnpike;
  return {
    ok: true,
    preview: {
      horizonHours,
      method: 'dp',
      stepMinutes: a.stepMinutes,
      deliverySteps,
      cost: summary.cost,
      earnings: summary.earnings,
      ...netMoney(plan.netFigures),
      endSocPct: summary.endSocPct,
      steps,
      decisionHorizonHours: plan.dpInsights?.decisionHorizonHours ?? null,
      decisionHorizonLimitedByData: plan.dpInsights?.limitedByData ?? false,
      turnpike: {
        nearSteadyShare: tp.nearSteadyShare,
        entryArcSteps: tp.entryArcSteps,
        leavingArcSteps: tp.leavingArcSteps,
        commitWindowSteps: tp.commitWindowSteps,
        flags: [...tp.flags],
      },
      computeMs: performance.now() - started,
    },
  };
}
