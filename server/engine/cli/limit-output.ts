/**
 * The command line's extra output for plans and reference paths with operating
 * limits (DESIGN section 3.3): why the LP solved it, how often each limit bound
 * in the delivery window and what holding reserve gave up; and the limit warnings.
 * Nothing is added for paths without these limits, so their output keeps its
 * exact shape.
 */
import type { DispatchSolution, TerminalRule } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { problemFor } from '../inputs/problem-for';
import { hasLimits, hasReserves, limitFeatures } from '../limits/limit-features';
import { limitBinding } from '../limits/read-limits';
import { reserveEffect } from '../limits/reserve-effect';
import { limitNotes, reserveDurationWarnings } from '../limits/limit-words';
import { limitSummary } from '../limits/limit-summary';

export interface LimitPath {
  /** Grid step of the solution's step 0, the end of the part reported (exclusive) and of the solution. */
  readonly from: number;
  readonly to: number;
  readonly windowEnd: number;
  readonly terminalRule: TerminalRule;
  readonly solution: DispatchSolution;
  readonly initialNetPowerKw?: number;
  readonly method: 'auto' | 'lp' | 'dp';
}

const slice = <T>(s: readonly T[] | undefined, n: number) => s?.slice(0, n);

/** `{ methodReason?, limits }` for a path with limits, `{}` without. */
export function limitOutput(inputs: AlignedInputs, path: LimitPath): Record<string, unknown> {
  const { solution, from, to, windowEnd } = path;
  const extras = path.initialNetPowerKw !== undefined ? { initialNetPowerKw: path.initialNetPowerKw } : {};
  const e0 = solution.socKwh[0]!;
  const window = problemFor(inputs, from, windowEnd, e0, path.terminalRule, extras);
  const features = limitFeatures(window);
  if (!hasLimits(features)) return {};
  const n = to - from;
  const schedule = {
    chargeKw: solution.chargeKw.slice(0, n),
    dischargeKw: solution.dischargeKw.slice(0, n),
    gridImportKw: solution.gridImportKw.slice(0, n),
    gridExportKw: solution.gridExportKw.slice(0, n),
    socKwh: solution.socKwh.slice(0, n + 1),
  };
  const delivery = problemFor(inputs, from, to, e0, path.terminalRule, extras);
  const binding = limitBinding(delivery, schedule, slice(solution.reserveUpKw, n), slice(solution.reserveDownKw, n));
  const effect = hasReserves(features) ? reserveEffect(window, solution, { method: path.method }) : null;
  const figures = limitSummary(inputs, solution, from, 0, n);
  return {
    ...(solution.methodReason !== undefined ? { methodReason: solution.methodReason } : {}),
    limits: {
      reserveHours: window.reserveHours ?? null,
      rampKwPerMin: features.rampKwPerMin,
      switchingCostPerMw: features.switchingCostPerMw,
      availability: features.availability,
      initialNetPowerKw: path.initialNetPowerKw ?? null,
      binding,
      reserveHeadroom: effect,
      notes: limitNotes({
        binding,
        hasRamp: features.rampKwPerMin !== null,
        hasAvailability: features.availability,
        ...figures,
        effect,
      }),
    },
  };
}

/** Setting warnings of the operating limits (a reserve duration the usable energy cannot sustain). */
export function limitWarnings(inputs: AlignedInputs): string[] {
  return inputs.reserveUpPrice || inputs.reserveDownPrice ? reserveDurationWarnings(inputs.battery, inputs.reserveHours) : [];
}
