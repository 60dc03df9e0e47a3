/**
 * The plan's turnpike figures as the plan page shows them: how long it stays
 * near the steady cycle, its entry and leaving arcs, and the commit window,
 * the part of the delivery window that agrees with a plan looking much further
 * ahead (the engine measures it and says how far that longer plan looked).
 * Definitions: docs/model.md.
 */
import type { PlanTurnpike } from '@shared/schemas/plan';
import type { Plan } from '../../engine';
import { turnpikeSentence } from './plan-words';

export function turnpikeInsight(plan: Plan, bandPct: number, stepMinutes: number, terminalRule: string): PlanTurnpike {
  const tp = plan.turnpike;
  const figures = {
    bandPct,
    bandKwh: tp.bandKwh,
    nearSteadyShare: tp.nearSteadyShare,
    entryArcSteps: tp.entryArcSteps,
    leavingArcSteps: tp.leavingArcSteps,
    excursions: {
      count: tp.excursions.count,
      steps: tp.excursions.steps,
      largestDistance: tp.excursions.largestDistance,
    },
    commitWindowSteps: tp.commitWindowSteps,
    longerLookaheadHours: tp.commitWindowSteps === null ? null : plan.longerLookaheadHours,
    value: {
      bandPerMwh: tp.value.band,
      nearSteadyShare: tp.value.nearSteadyShare,
      entryArcSteps: tp.value.entryArcSteps,
      leavingArcSteps: tp.value.leavingArcSteps,
      commitWindowSteps: tp.value.commitWindowSteps,
    },
    flags: [...tp.flags],
  };
  return { ...figures, summary: turnpikeSentence(figures, stepMinutes, terminalRule) };
}
