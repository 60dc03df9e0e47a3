/**
 * The operating-limit figures of part of a solved path, for the summaries people
 * read (plan delivery window and lookahead, reference path): reserve held per
 * interval, reserve revenue (cash, subtracted from `cost`) and the switching
 * penalty (not cash). Empty for paths without these limits, so their summaries
 * stay exactly as before.
 */
import type { DispatchSolution } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { reserveRevenue, switchingPenalty } from './read-limits';

export interface LimitSummary {
  readonly reserveRevenue?: number;
  readonly switchingPenalty?: number;
}

/** Figures of solution steps [from, to), whose step 0 is grid step `offset`. */
export function limitSummary(
  inputs: AlignedInputs,
  solution: DispatchSolution,
  offset: number,
  from: number,
  to: number,
): LimitSummary {
  const n = solution.chargeKw.length;
  const out: { reserveRevenue?: number; switchingPenalty?: number } = {};
  if (solution.reserveUpKw || solution.reserveDownKw) {
    const slice = (s: readonly number[] | undefined) => s?.slice(offset, offset + n);
    const prices = {
      stepHours: inputs.stepHours,
      ...(inputs.reserveUpPrice ? { reserveUpPrice: slice(inputs.reserveUpPrice) } : {}),
      ...(inputs.reserveDownPrice ? { reserveDownPrice: slice(inputs.reserveDownPrice) } : {}),
    };
    out.reserveRevenue = reserveRevenue(prices, solution.reserveUpKw, solution.reserveDownKw, from, to);
  }
  if (solution.switchingPenalty !== undefined) {
    // Step 0's change is from the power before the window, known to the solution's total only.
    const battery = { battery: inputs.battery };
    out.switchingPenalty =
      from === 0
        ? solution.switchingPenalty - switchingPenalty(battery, solution, to, n)
        : switchingPenalty(battery, solution, from, to);
  }
  return out;
}

/** The reserve held at solution step t, for a series point (nothing when the path holds none). */
export function reserveAt(solution: DispatchSolution, t: number): { reserveUpKw?: number; reserveDownKw?: number } {
  if (!solution.reserveUpKw || !solution.reserveDownKw) return {};
  return { reserveUpKw: solution.reserveUpKw[t]!, reserveDownKw: solution.reserveDownKw[t]! };
}
