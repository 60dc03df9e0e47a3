/**
 * Turnpike figures of a plan: SoC and stored-energy value against the steady
 * cycle repeated by local time of day, and the commit window against a plan of a
 * much longer lookahead from the same state. Stored-energy values are compared
 * only where both SoCs are strictly inside the window, because the dual is not
 * unique at a bound (docs/sources.md: degeneracy).
 */
import type { DispatchSolution } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { usableEnergyKwh } from '../inputs/problem-for';
import { energyBounds } from '../model/build-dispatch-model';
import { steadySocAt, steadyValueAt, type SteadyCycle } from '../steady/solve-steady-cycle';
import { minuteOfDayAt } from '../terminal/terminal-choice';
import { arcFigures, commitWindowSteps, excursionFigures, type ArcFigures, type Excursions } from '../turnpike/turnpike-figures';

export interface PlanTurnpike {
  /** SoC band as a fraction of usable energy. */
  readonly band: number;
  readonly bandKwh: number;
  readonly nearSteadyShare: number;
  readonly entryArcSteps: number;
  readonly leavingArcSteps: number;
  /** Stretches outside the band between the entry and the leaving arc; distances as fractions of usable energy. */
  readonly excursions: Excursions;
  /** Leading steps within the band of the longer plan; null when no longer plan could be solved. */
  readonly commitWindowSteps: number | null;
  /** |SoC − steady SoC| / usable energy per step. */
  readonly distance: readonly number[];
  readonly value: {
    /** Band in currency/MWh: the same fraction of the representative day's price spread. */
    readonly band: number;
    readonly nearSteadyShare: number;
    readonly entryArcSteps: number;
    readonly leavingArcSteps: number;
    /** As `excursions`, distances in currency/MWh. */
    readonly excursions: Excursions;
    readonly commitWindowSteps: number | null;
    /** |value − steady value| in currency/MWh per step (0 where not comparable). */
    readonly distance: readonly number[];
  };
  readonly flags: string[];
}

/** Excursions with their distances multiplied by `scale` (fractions of the price spread → currency/MWh). */
function scaled(ex: Excursions, scale: number): Excursions {
  return {
    ...ex,
    largestDistance: ex.largestDistance * scale,
    stretches: ex.stretches.map((s) => ({ ...s, largestDistance: s.largestDistance * scale })),
  };
}

export function strictlyInside(soc: number, min: number, max: number): boolean {
  const tol = 1e-6 * Math.max(1, max);
  return soc > min + tol && soc < max - tol;
}

export function planTurnpike(
  inputs: AlignedInputs,
  from: number,
  plan: DispatchSolution,
  steady: SteadyCycle,
  longer: DispatchSolution | null,
  bandFraction: number,
): PlanTurnpike {
  const n = plan.chargeKw.length;
  const usable = usableEnergyKwh(inputs.battery);
  const { min, max } = energyBounds(inputs);
  const planSoc = plan.socKwh.slice(1);
  const steadySoc: number[] = [];
  const steadyValue: number[] = [];
  for (let t = 0; t < n; t++) {
    const minute = minuteOfDayAt(inputs, from + t + 1);
    const soc = steadySocAt(steady, minute);
    steadySoc.push(soc);
    const comparable = strictlyInside(planSoc[t]!, min, max) && strictlyInside(soc, min, max);
    steadyValue.push(comparable ? steadyValueAt(steady, minute) : Number.NaN);
  }
  const prices = steady.slots.map((s) => s.priceImport);
  const spread = Math.max(1e-9, Math.max(...prices) - Math.min(...prices));
  const soc: ArcFigures = arcFigures(planSoc, steadySoc, usable, bandFraction);
  const value: ArcFigures = arcFigures(plan.storedEnergyValue, steadyValue, spread, bandFraction);
  const longerValue = longer
    ? longer.storedEnergyValue.map((v, t) => (strictlyInside(planSoc[t] ?? NaN, min, max) ? v : plan.storedEnergyValue[t]!))
    : null;
  return {
    band: bandFraction,
    bandKwh: bandFraction * usable,
    nearSteadyShare: soc.nearSteadyShare,
    entryArcSteps: soc.entryArcSteps,
    leavingArcSteps: soc.leavingArcSteps,
    excursions: excursionFigures(soc),
    commitWindowSteps: longer ? commitWindowSteps(planSoc, longer.socKwh.slice(1), usable, bandFraction) : null,
    distance: soc.distance,
    value: {
      band: bandFraction * spread,
      nearSteadyShare: value.nearSteadyShare,
      entryArcSteps: value.entryArcSteps,
      leavingArcSteps: value.leavingArcSteps,
      excursions: scaled(excursionFigures(value), spread),
      commitWindowSteps: longerValue ? commitWindowSteps(plan.storedEnergyValue, longerValue, spread, bandFraction) : null,
      distance: value.distance.map((d) => d * spread),
    },
    flags: [],
  };
}
