import type { DispatchProblem, DispatchSolution } from '../types';
import { solveDispatchDp } from './solve';
import { DpValueFunctions } from './value-functions';

/** Stored-energy value (currency/MWh) against SoC (% of nameplate energy) at one time. */
export interface ValueCurve {
  /** UTC epoch milliseconds: energy held at this instant (the start of a step, or the end of the last). */
  readonly time: number;
  /** A staircase: each piece of V contributes its two ends with the same value, SoC ascending. */
  readonly points: readonly { readonly socPct: number; readonly value: number }[];
}

export type ValueCurveSource = DpValueFunctions | (DispatchSolution & { readonly valueFunctions?: DpValueFunctions });

/**
 * Value curves: −1000·V_t′(e), the value of one more MWh held at time t as a
 * function of the SoC, for each requested time (the stored-energy
 * value, docs/model.md). `times` must be step starts of the problem or its end.
 * Without value functions in `source`, the problem is solved again to get them.
 * Returns an error message instead when a time is off the grid or the problem
 * has no DP solution.
 */
export function valueCurves(
  problem: DispatchProblem,
  source: ValueCurveSource | null,
  times: readonly number[],
): { ok: true; curves: ValueCurve[] } | { ok: false; error: string } {
  let vf = source instanceof DpValueFunctions ? source : source?.valueFunctions;
  if (!vf) {
    const solved = solveDispatchDp(problem, { keepValueFunctions: true });
    if (!solved.valueFunctions) return { ok: false, error: solved.message ?? `the problem has no solution (${solved.status})` };
    vf = solved.valueFunctions;
  }
  const n = problem.timesMs.length;
  const endMs = (problem.timesMs[n - 1] ?? 0) + problem.stepHours * 3_600_000;
  const energy = problem.battery.energyKwh;
  const curves: ValueCurve[] = [];
  for (const time of times) {
    const t = time === endMs ? n : problem.timesMs.indexOf(time);
    if (t < 0)
      return { ok: false, error: `no step starts at ${new Date(time).toISOString()}; give the start of a step of the problem` };
    const { breakpoints, slopes } = vf.at(t);
    const points: { socPct: number; value: number }[] = [];
    for (let i = 0; i < slopes.length; i++) {
      const value = -(slopes[i] ?? 0) * 1000;
      points.push({ socPct: ((breakpoints[i] ?? 0) / energy) * 100, value });
      points.push({ socPct: ((breakpoints[i + 1] ?? 0) / energy) * 100, value });
    }
    curves.push({ time, points });
  }
  return { ok: true, curves };
}
