/**
 * Horizon study: closed-loop receding-horizon runs over [start, end) for every
 * horizon H and terminal rule, each compared with the reference path over the
 * same period from the same initial SoC with the free terminal rule (fair because
 * no window reads past `end`). Runs are independent, so they share the cores.
 */
import type { AlignedInputs } from '../inputs/align-inputs';
import type { InputIssue } from '../model/validate-battery';
import { problemFor, socPctToKwh, stepIndexOf, usableEnergyKwh } from '../inputs/problem-for';
import { checkDp } from '../dispatch/dp-bridge';
import { solveReferencePath, steadyFor } from '../reference/solve-reference-path';
import { terminalLabel, type TerminalChoice } from '../terminal/terminal-choice';
import type { DaySelection } from '../steady/representative-day';
import { DEFAULT_BAND_FRACTION } from '../turnpike/turnpike-figures';
import { DEFAULT_GAP_TARGET_PCT, recommendHorizon, type Recommendation } from './recommend-horizon';
import { runClosedLoopParallel } from './parallel-closed-loop';
import { runStudyJob, withoutSeries, type StudyJob, type StudyJobContext, type StudyJobResult } from './study-job';
import { defaultWorkerCount, runJobsOnWorkers } from './worker-pool';
import type { StoredEnergyValuation } from '../value/net-figures';
import { valuedRun } from './valued-run';

export interface StudyRequest {
  /** Defaults: the whole period of the inputs. */
  readonly startMs?: number;
  readonly endMs?: number;
  readonly horizonsHours: readonly number[];
  readonly replanHours: number;
  readonly terminals: readonly TerminalChoice[];
  readonly initialSocPct?: number;
  /** Which local days the steady cycle of the steady-value rule averages (default all). */
  readonly steadyDays?: DaySelection;
  readonly gapTargetPct?: number;
  readonly bandFraction?: number;
  readonly method?: 'auto' | 'lp' | 'dp';
  /** Worker threads; 0 or 1 runs everything in this thread. Default: one per core (max 4). */
  readonly workers?: number;
  readonly onProgress?: (done: number, total: number) => void;
}

export interface StudyRun extends StudyJobResult {
  readonly horizonHours: number;
  readonly terminal: string;
  /** (cost − reference cost) / |reference cost| in %. */
  readonly gapPct: number;
  /** Change in the value of stored energy over the period (currency; steady cycle's λ̄, DESIGN section 3.1). */
  readonly storedEnergyChange: number;
  /** cost − storedEnergyChange: what every ranking of runs uses. */
  readonly netCost: number;
  /** The site over the period with no battery (0 for pure arbitrage). */
  readonly noBatteryCost: number;
  /** noBatteryCost − netCost. */
  readonly batteryValue: number;
  /** netCost − the reference path's netCost, currency. */
  readonly gapValue: number;
  /** 100·gapValue / |the reference path's batteryValue|, in %. */
  readonly valueGapPct: number;
}

export interface HorizonStudy {
  readonly referenceCost: number;
  /** The reference path's net cost (stored energy valued as in every run). */
  readonly referenceNetCost: number;
  /** The reference path's battery value: the scale of valueGapPct. */
  readonly referenceBatteryValue: number;
  readonly noBatteryCost: number;
  /** How stored energy was valued, with the reference path's energies. */
  readonly storedEnergyValuation: StoredEnergyValuation;
  readonly referenceEquivalentCycles: number;
  readonly runs: readonly StudyRun[];
  readonly recommendation: Recommendation;
  readonly seconds: number;
  readonly workers: number;
}

export type StudyResult = { ok: true; study: HorizonStudy } | { ok: false; issue: InputIssue };

const fail = (field: string, message: string): StudyResult => ({ ok: false, issue: { field, message } });

function toSteps(inputs: AlignedInputs, hours: number, what: string): number | string {
  const steps = (hours * 60) / inputs.stepMinutes;
  return Number.isInteger(steps) && steps >= 1
    ? steps
    : `${what} ${hours} h is not a whole, positive number of ${inputs.stepMinutes}-minute steps`;
}

export function gapPct(cost: number, referenceCost: number): number {
  const diff = cost - referenceCost;
  return Math.abs(diff) <= 1e-9 * Math.max(1, Math.abs(referenceCost))
    ? 0
    : (100 * diff) / Math.max(Math.abs(referenceCost), 1e-9);
}

export async function runHorizonStudy(inputs: AlignedInputs, request: StudyRequest): Promise<StudyResult> {
  const started = performance.now();
  const start = stepIndexOf(inputs, request.startMs ?? inputs.timesMs[0]!, 'the study start');
  if (!start.ok) return fail('start', start.message);
  const end =
    request.endMs === undefined
      ? { ok: true as const, index: inputs.timesMs.length }
      : stepIndexOf(inputs, request.endMs, 'the study end');
  if (!end.ok) return fail('end', end.message);
  if (end.index <= start.index) return fail('end', 'the study end must be after its start');
  if (request.horizonsHours.length === 0 || request.terminals.length === 0)
    return fail('horizons', 'give at least one horizon and one terminal rule');
  const replanSteps = toSteps(inputs, request.replanHours, 'the re-plan interval');
  if (typeof replanSteps === 'string') return fail('replan', replanSteps);
  const jobs: StudyJob[] = [];
  for (const hours of request.horizonsHours) {
    const steps = toSteps(inputs, hours, 'the horizon');
    if (typeof steps === 'string') return fail('horizons', steps);
    if (steps < replanSteps)
      return fail('horizons', `the horizon ${hours} h is shorter than the re-plan interval ${request.replanHours} h`);
    for (const terminal of request.terminals) jobs.push({ horizonHours: hours, horizonSteps: steps, terminal });
  }
  const steady = steadyFor(inputs, request.terminals, undefined, request.steadyDays);
  if (!steady.ok) return steady;
  const reference = solveReferencePath(inputs, {
    from: start.index,
    to: end.index,
    terminal: { kind: 'free' },
    ...(steady.steady ? { steady: steady.steady } : {}),
    ...(request.steadyDays ? { steadyDays: request.steadyDays } : {}),
    ...(request.initialSocPct !== undefined ? { initialSocPct: request.initialSocPct } : {}),
    ...(request.method ? { method: request.method } : {}),
  });
  if (!reference.ok) return reference;
  const ref = reference.path.solution;
  const refNet = reference.path.netFigures;
  if (ref.status !== 'optimal' || !refNet)
    return fail('reference', `the reference path could not be solved: ${ref.message ?? ref.status}`);
  const context: StudyJobContext = {
    inputs,
    from: start.index,
    to: end.index,
    replanSteps,
    initialEnergyKwh: socPctToKwh(inputs, request.initialSocPct ?? inputs.battery.socInitialPct),
    referenceSoc: ref.socKwh.slice(1),
    bandFraction: request.bandFraction ?? DEFAULT_BAND_FRACTION,
    method: request.method ?? 'auto',
    ...(steady.steady ? { steady: steady.steady } : {}),
  };
  // On the exact DP a run takes milliseconds, less than starting a worker thread.
  const onDp =
    context.method !== 'lp' && checkDp(problemFor(inputs, start.index, end.index, context.initialEnergyKwh, { kind: 'free' })).ok;
  const workers = request.workers ?? (onDp ? 1 : defaultWorkerCount());
  const results =
    workers > 1 && jobs.length > 1
      ? await runJobsOnWorkers<StudyJobResult>(context, jobs, workers, (_, done) => request.onProgress?.(done, jobs.length))
      : workers > 1 && !onDp
        ? // A single run: split it over the cores instead (speculative stretches, same result).
          [
            withoutSeries(
              context,
              await runClosedLoopParallel(context, jobs[0]!, workers).finally(() => request.onProgress?.(1, 1)),
            ),
          ]
        : jobs.map((job, i) => {
            const result = runStudyJob(context, job);
            request.onProgress?.(i + 1, jobs.length);
            return result;
          });
  const runs: StudyRun[] = results.map((result, i) => ({
    ...result,
    horizonHours: jobs[i]!.horizonHours,
    terminal: terminalLabel(jobs[i]!.terminal),
    gapPct: result.status === 'optimal' ? gapPct(result.cost, ref.cost) : NaN,
    ...valuedRun(inputs, context, result, refNet, steady),
  }));
  return {
    ok: true,
    study: {
      referenceCost: ref.cost,
      referenceNetCost: refNet.netCost,
      referenceBatteryValue: refNet.batteryValue,
      noBatteryCost: refNet.noBatteryCost,
      storedEnergyValuation: refNet.storedEnergyValuation,
      referenceEquivalentCycles: ref.dischargeKw.reduce((s, d) => s + d * inputs.stepHours, 0) / usableEnergyKwh(inputs.battery),
      runs,
      recommendation: recommendHorizon(runs, request.gapTargetPct ?? DEFAULT_GAP_TARGET_PCT, inputs.site.currency),
      seconds: (performance.now() - started) / 1000,
      workers: workers <= 1 ? 1 : jobs.length > 1 ? Math.min(workers, jobs.length) : onDp ? 1 : workers,
    },
  };
}
