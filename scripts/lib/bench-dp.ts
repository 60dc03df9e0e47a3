/**
 * Micro benchmark of the exact dynamic program against a plain GLPK window the
 * caller builds, for `npm run bench` (scripts/bench.ts). Pure computation on the
 * problem it is given; prints nothing itself. Times are process CPU milliseconds (the 2-core machine is
 * often shared, which inflates wall-clock times far more); DP times are the
 * best of `repeats` runs (the first runs include JIT compilation); GLPK
 * baselines run once in the same process.
 */
import type { DispatchProblem, TerminalRule } from '../../server/engine/types';
import { createDpClosedLoop } from '../../server/engine/dp/closed-loop';
import { solveDispatchDp } from '../../server/engine/dp/solve';

export interface DpBenchOptions {
  /** The problem whose whole horizon and receding-horizon loops are timed. */
  readonly problem: DispatchProblem;
  /** DP timings are the best of this many runs (default 5). */
  readonly repeats?: number;
  /** Measure the GLPK baselines (default true). */
  readonly glpk?: boolean;
  /** The plain GLPK solve of steps [start, start + steps) from energy e0, returning e_1 (kWh). */
  readonly glpkWindow: (start: number, steps: number, e0: number) => number;
  /** Closed-loop horizons compared with a plain GLPK loop, hours (default [24, 168]). */
  readonly loopHorizonsHours?: readonly number[];
  /** Time the GLPK loop on every k-th window only and scale up, for horizons above 48 h (default 8). */
  readonly glpkLoopEvery?: number;
}

/** All times are process CPU milliseconds. */
export interface DpBenchResult {
  readonly steps: number;
  readonly reference: { readonly dpMs: number; readonly glpkMs: number | null; readonly dpShareOfGlpkPct: number | null };
  readonly closedLoop: readonly {
    readonly horizonHours: number;
    readonly dpWarmMs: number;
    readonly dpColdMs: number;
    readonly dpWarmWithPlansMs: number;
    readonly warmEqualsCold: boolean;
    readonly glpkLoopMs: number | null;
    /** 1 = every window solved by GLPK; k > 1 = every k-th window timed and scaled by the window count. */
    readonly glpkLoopEvery: number;
    readonly dpShareOfGlpkPct: number | null;
  }[];
  /** Six horizons (6–168 h) × {free, steady-value}, re-planning hourly, DP only. */
  readonly sixHorizonsTwoRules: { readonly ms: number; readonly withPlansMs: number };
}

/** Process CPU milliseconds of one call. */
function cpuMs(run: () => void): number {
  const before = process.cpuUsage();
  run();
  const used = process.cpuUsage(before);
  return (used.user + used.system) / 1000;
}

function bestOf(repeats: number, run: () => void): number {
  let best = Infinity;
  for (let i = 0; i < repeats; i++) best = Math.min(best, cpuMs(run));
  return best;
}

/**
 * The plain GLPK receding-horizon loop (re-plan every step, apply one): with
 * `every` > 1 only every k-th window is solved, from the states the DP's
 * closed loop visits, and the time is scaled to all windows.
 */
function glpkLoopMs(
  p: DispatchProblem,
  solveWindow: (start: number, steps: number, e0: number) => number,
  horizon: number,
  every: number,
  dpSoc: readonly number[],
): number {
  const n = p.priceImport.length;
  let solved = 0;
  const ms = cpuMs(() => {
    let e = p.initialEnergyKwh;
    for (let s = 0; s < n; s += every) {
      const e1 = solveWindow(s, Math.min(n, s + horizon) - s, every === 1 ? e : (dpSoc[s] ?? e));
      if (every === 1) e = e1;
      solved++;
    }
  });
  // One window per step when re-planning every step.
  return (ms * n) / solved;
}

/** Runs the DP figures and (unless `glpk` is false) their GLPK baselines. */
export function benchDp(options: DpBenchOptions): DpBenchResult {
  const p = options.problem;
  const repeats = options.repeats ?? 5;
  const n = p.priceImport.length;
  const steps = (hours: number): number => Math.round(hours / p.stepHours);
  const measure = options.glpk !== false;
  const solveWindow = options.glpkWindow;
  const dpMs = bestOf(repeats * 3, () => solveDispatchDp(p));
  const glpkYearMs = measure ? cpuMs(() => solveWindow(0, n, p.initialEnergyKwh)) : null;
  const loop = createDpClosedLoop(p);
  const closedLoop = (options.loopHorizonsHours ?? [24, 168]).map((hours) => {
    const h = steps(hours);
    const warmRun = loop.run({ horizonSteps: h, replanSteps: 1 }).solution;
    const coldRun = loop.run({ horizonSteps: h, replanSteps: 1, warm: false }).solution;
    const same = (a: readonly number[], b: readonly number[]): boolean =>
      a.length === b.length && a.every((v, i) => Object.is(v, b[i]));
    const warmEqualsCold =
      same(warmRun.socKwh, coldRun.socKwh) &&
      same(warmRun.chargeKw, coldRun.chargeKw) &&
      same(warmRun.storedEnergyValue, coldRun.storedEnergyValue);
    const dpWarmMs = bestOf(repeats, () => loop.run({ horizonSteps: h, replanSteps: 1 }));
    const dpColdMs = bestOf(Math.min(repeats, 2), () => loop.run({ horizonSteps: h, replanSteps: 1, warm: false }));
    const dpWarmWithPlansMs = bestOf(Math.min(repeats, 3), () =>
      loop.run({ horizonSteps: h, replanSteps: 1, onPlan: () => undefined }),
    );
    const every = hours > 48 ? (options.glpkLoopEvery ?? 8) : 1;
    const glpkMs = measure ? glpkLoopMs(p, solveWindow, h, every, warmRun.socKwh) : null;
    return {
      horizonHours: hours,
      dpWarmMs,
      dpColdMs,
      dpWarmWithPlansMs,
      warmEqualsCold,
      glpkLoopMs: glpkMs,
      glpkLoopEvery: every,
      dpShareOfGlpkPct: glpkMs === null ? null : (100 * dpWarmMs) / glpkMs,
    };
  });
  // steady-value needs λ̄ by time of day; the reference path's mean stored-energy value per
  // clock hour stands in for the steady cycle here (timing only).
  const reference = solveDispatchDp(p);
  const byHour = new Array<number>(24).fill(0);
  reference.storedEnergyValue.forEach((v, t) => (byHour[t % 24]! += v / (n / 24)));
  const rules: ((s: number, end: number) => TerminalRule)[] = [
    () => ({ kind: 'free' }),
    (_s, end) => ({ kind: 'steady-value', valuePerMwh: byHour[end % 24] ?? 0 }),
  ];
  const horizons = [6, 12, 24, 48, 96, 168].map(steps);
  const six = (withPlans: boolean) => () => {
    for (const h of horizons) {
      for (const rule of rules)
        loop.run({ horizonSteps: h, replanSteps: 1, terminalForWindow: rule, ...(withPlans ? { onPlan: () => undefined } : {}) });
    }
  };
  return {
    steps: n,
    reference: { dpMs, glpkMs: glpkYearMs, dpShareOfGlpkPct: glpkYearMs === null ? null : (100 * dpMs) / glpkYearMs },
    closedLoop,
    sixHorizonsTwoRules: { ms: bestOf(Math.min(repeats, 3), six(false)), withPlansMs: bestOf(Math.min(repeats, 2), six(true)) },
  };
}
