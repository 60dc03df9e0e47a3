/** Plan steps as chart points: delivery and lookahead apart (the lookahead drawn differently). */
import type { PlanResults, PlanStep } from '@shared/schemas/plan';

export interface StepPoint {
  /** Start of the step, epoch ms (prices and power belong to the interval). */
  t: number;
  /** End of the step, epoch ms (SoC and stored-energy value are at the end of the step). */
  tEnd: number;
  step: PlanStep;
}

export interface SplitSteps {
  all: StepPoint[];
  delivery: StepPoint[];
  /** Starts with the last delivery step so the two lines join. */
  lookahead: StepPoint[];
  leaving: StepPoint[];
  entry: StepPoint[];
}

export function splitSteps(results: PlanResults): SplitSteps {
  const stepMs = results.stepMinutes * 60_000;
  const all = results.steps.map((step) => ({ t: Date.parse(step.time), tEnd: Date.parse(step.time) + stepMs, step }));
  const delivery = all.slice(0, results.deliverySteps);
  const lookahead = results.deliverySteps < all.length ? all.slice(Math.max(0, results.deliverySteps - 1)) : [];
  return {
    all,
    delivery,
    lookahead,
    leaving: all.filter((p) => p.step.arc === 'leaving'),
    entry: all.filter((p) => p.step.arc === 'entry'),
  };
}

/** The first and last instant of a set of points (for the time axis: its ticks lie within the data). */
export function extentOf<T>(points: readonly T[], at: (p: T) => number): { startMs: number; endMs: number } {
  let startMs = Infinity;
  let endMs = -Infinity;
  for (const p of points) {
    const t = at(p);
    if (t < startMs) startMs = t;
    if (t > endMs) endMs = t;
  }
  return { startMs, endMs };
}

/** SoC and stored-energy value belong to the end of their step. */
export const atStepEnd = (p: StepPoint) => new Date(p.tEnd);
