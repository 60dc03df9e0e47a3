/**
 * The turnpike figures of a plan in plain words for the plan page, e.g.
 * "Stays near the steady cycle 86 % of the time; the last 5 h leave it: energy
 * is sold off because nothing values it after the horizon." The engine's word
 * functions build every clause from the figure it names, so the sentence names
 * the excursions the distance chart shows.
 */
import type { PlanTurnpike } from '@shared/schemas/plan';
import { durationWords, turnpikeWords } from '../../engine';

export { durationWords };

/** No excursions: the figures of plans stored before they were counted. */
const NONE = { count: 0, steps: 0, largestDistance: 0 };

export function turnpikeSentence(tp: Omit<PlanTurnpike, 'summary'>, stepMinutes: number, terminalRule: string): string {
  return turnpikeWords(
    {
      nearSteadyShare: tp.nearSteadyShare,
      bandPct: tp.bandPct,
      entryArcSteps: tp.entryArcSteps,
      leavingArcSteps: tp.leavingArcSteps,
      excursions: tp.excursions ?? NONE,
      commitWindowSteps: tp.commitWindowSteps,
      longerLookaheadHours: tp.longerLookaheadHours,
    },
    stepMinutes,
    terminalRule,
  );
}
