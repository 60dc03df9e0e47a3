/**
 * A plan's turnpike figures in plain words, every clause computed from the
 * figure it names, so the sentence cannot contradict the distance chart: the
 * near-steady share, the entry arc, the excursions between the arcs, the
 * leaving arc and the commit window (DESIGN section 2 words), e.g.
 * "Stays near the steady cycle 78 % of the time (within 5 % of usable energy);
 * the first 2 h approach it from the starting SoC; in between it leaves the
 * band twice, for 7 h in all, at most 67 % of usable energy away; it is back
 * near the steady cycle at the end of the horizon."
 */
import type { Excursions } from './turnpike-figures';

/** The figures the sentence reads (the plan's turnpike figures; SoC distances as fractions of usable energy). */
export interface TurnpikeWordsFigures {
  readonly nearSteadyShare: number;
  /** Band in % of usable energy. */
  readonly bandPct: number;
  readonly entryArcSteps: number;
  readonly leavingArcSteps: number;
  readonly excursions: Pick<Excursions, 'count' | 'steps' | 'largestDistance'>;
  readonly commitWindowSteps: number | null;
  readonly longerLookaheadHours: number | null;
}

export function durationWords(steps: number, stepMinutes: number): string {
  const minutes = steps * stepMinutes;
  if (minutes < 60) return `${minutes} min`;
  const hours = minutes / 60;
  return `${Number.isInteger(hours) ? hours : hours.toFixed(1)} h`;
}

const times = (count: number) => (count === 1 ? 'once' : count === 2 ? 'twice' : `${count} times`);

/** "in between it leaves the band twice, for 7 h in all, at most 67 % of usable energy away", or null when it never does. */
export function excursionWords(excursions: TurnpikeWordsFigures['excursions'], stepMinutes: number): string | null {
  if (excursions.count === 0) return null;
  const span = durationWords(excursions.steps, stepMinutes);
  const extent = `at most ${Math.round(excursions.largestDistance * 100)} % of usable energy away`;
  return excursions.count === 1
    ? `in between it leaves the band once, for ${span}, ${extent}`
    : `in between it leaves the band ${times(excursions.count)}, for ${span} in all, ${extent}`;
}

function leavingReason(terminalRule: string): string {
  if (terminalRule === 'free') return 'energy is sold off because nothing values it after the horizon';
  if (terminalRule === 'cyclic') return 'the plan steers back to the SoC it started with';
  if (terminalRule.startsWith('target:')) return `the plan steers to its end target of ${terminalRule.slice(7)} % SoC`;
  return 'the end of the horizon still pulls the plan away, although energy left over keeps its steady value';
}

/** The clause about the end of the horizon, which must agree with the excursions before it. */
export function leavingWords(figures: TurnpikeWordsFigures, stepMinutes: number, terminalRule: string): string {
  if (figures.leavingArcSteps > 0)
    return `the last ${durationWords(figures.leavingArcSteps, stepMinutes)} leave it: ${leavingReason(terminalRule)}`;
  if (figures.nearSteadyShare === 0) return 'it never comes within the band';
  return figures.excursions.count > 0
    ? 'it is back near the steady cycle at the end of the horizon'
    : 'it does not leave the steady cycle before the end of the horizon';
}

/** The whole sentence for a plan page. */
export function turnpikeWords(figures: TurnpikeWordsFigures, stepMinutes: number, terminalRule: string): string {
  const parts = [
    `Stays near the steady cycle ${Math.round(figures.nearSteadyShare * 100)} % of the time (within ${figures.bandPct} % of usable energy)`,
  ];
  if (figures.entryArcSteps > 0 && figures.nearSteadyShare > 0)
    parts.push(`the first ${durationWords(figures.entryArcSteps, stepMinutes)} approach it from the starting SoC`);
  const between = excursionWords(figures.excursions, stepMinutes);
  if (between) parts.push(between);
  parts.push(leavingWords(figures, stepMinutes, terminalRule));
  let sentence = `${parts.join('; ')}.`;
  if (figures.commitWindowSteps !== null && figures.longerLookaheadHours !== null) {
    sentence += ` The first ${durationWords(figures.commitWindowSteps, stepMinutes)} agree with a plan looking ${figures.longerLookaheadHours} h ahead: that part is safe to commit.`;
  }
  return sentence;
}

/** The figures of a solved plan as the sentence reads them. */
export function planWordsFigures(plan: {
  readonly turnpike: {
    readonly band: number;
    readonly nearSteadyShare: number;
    readonly entryArcSteps: number;
    readonly leavingArcSteps: number;
    readonly excursions: Excursions;
    readonly commitWindowSteps: number | null;
  };
  readonly longerLookaheadHours: number | null;
}): TurnpikeWordsFigures {
  const tp = plan.turnpike;
  return {
    nearSteadyShare: tp.nearSteadyShare,
    bandPct: Number((tp.band * 100).toFixed(6)),
    entryArcSteps: tp.entryArcSteps,
    leavingArcSteps: tp.leavingArcSteps,
    excursions: tp.excursions,
    commitWindowSteps: tp.commitWindowSteps,
    longerLookaheadHours: plan.longerLookaheadHours,
  };
}
