/**
 * What the exact path (the dynamic program) adds to a plan: the decision
 * horizon, how far ahead prices can still change the first decisions, and
 * value curves, the value of stored energy against SoC at chosen times.
 * Definitions: docs/model.md.
 */
import type { PlanResults } from '@shared/schemas/plan';
import type { Plan } from '../../engine';

/** Value curves kept per plan: a week of hourly curves would swell every read of the plan. */
const MAX_VALUE_CURVES = 25;

function evenlySpaced<T>(items: readonly T[], max: number): T[] {
  if (items.length <= max) return [...items];
  const every = Math.ceil(items.length / max);
  return items.filter((_, i) => i % every === 0);
}

export function exactPathInsights(plan: Plan): Pick<PlanResults, 'decisionHorizonHours' | 'valueCurves'> & { notes: string[] } {
  const dp = plan.dpInsights;
  return {
    decisionHorizonHours: dp?.decisionHorizonHours ?? null,
    valueCurves: evenlySpaced(dp?.valueCurves ?? [], MAX_VALUE_CURVES).map((c) => ({ time: c.time, points: [...c.points] })),
    notes: dp?.limitedByData
      ? ['The decision horizon reaches the end of the lookahead: prices beyond it might still change the delivery decisions.']
      : [],
  };
}
