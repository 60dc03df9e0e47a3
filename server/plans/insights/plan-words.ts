/**
 * The turnpike figures of a plan in plain words for the plan page, e.g.
 * "Stays near the steady cycle 86 % of the time; the last 5 h leave it: energy
 * is sold off because nothing values it after the horizon."
 */
import type { PlanTurnpike } from '@shared/schemas/plan';

export function durationWords(steps: number, stepMinutes: number): string {
  const minutes = steps * stepMinutes;
  if (minutes < 60) return `${minutes} min`;
  const hours = minutes / 60;
  return `${Number.isInteger(hours) ? hours : hours.toFixed(1)} h`;
}

function leavingReason(terminalRule: string): string {
  if (terminalRule === 'free') return 'energy is sold off because nothing values it after the horizon';
  if (terminalRule === 'cyclic') return 'the plan steers back to the SoC it started with';
  if (terminalRule.startsWith('target:')) return `the plan steers to its end target of ${terminalRule.slice(7)} % SoC`;
  return 'the end of the horizon still pulls the plan away, although energy left over keeps its steady value';
}

export function turnpikeSentence(tp: Omit<PlanTurnpike, 'summary'>, stepMinutes: number, terminalRule: string): string {
  const parts = [
    `Stays near the steady cycle ${Math.round(tp.nearSteadyShare * 100)} % of the time (within ${tp.bandPct} % of usable energy)`,
  ];
  if (tp.entryArcSteps > 0)
    parts.push(`the first ${durationWords(tp.entryArcSteps, stepMinutes)} approach it from the starting SoC`);
  if (tp.leavingArcSteps > 0)
    parts.push(`the last ${durationWords(tp.leavingArcSteps, stepMinutes)} leave it: ${leavingReason(terminalRule)}`);
  else parts.push('it does not leave the steady cycle before the end of the horizon');
  let sentence = `${parts.join('; ')}.`;
  if (tp.commitWindowSteps !== null && tp.longerLookaheadHours !== null) {
    sentence += ` The first ${durationWords(tp.commitWindowSteps, stepMinutes)} agree with a plan looking ${tp.longerLookaheadHours} h ahead: that part is safe to commit.`;
  }
  return sentence;
}
