/**
 * One closed-loop run on several cores. The run is sequential by nature (each
 * window starts from the state the previous one left), so the later stretches
 * start speculatively: stretch k begins `overlap` steps before its boundary from
 * a guessed energy. By the turnpike property, receding-horizon trajectories from
 * different states meet (typically when the battery reaches a bound of its
 * window); from a step where the speculative state equals the exact one, the rest
 * of that stretch is the same run, because each window's schedule depends only
 * on the state (and ties are broken by the documented rule). If they never meet
 * inside the overlap, the stretch is recomputed from the exact state, so the
 * result never rests on the guess. Only runs whose whole state is the SoC qualify
 * (no demand charge, no throughput cap, no ramp rate or switching cost) and that
 * earn nothing beside the schedule (no reserves).
 */
import type { ScheduleSeries, ScheduleSeriesBuilder } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { usableEnergyKwh } from '../inputs/problem-for';
import { scheduleCost } from '../dispatch/schedule-cost';
import type { ClosedLoopRun, PlanLog } from './run-closed-loop';
import { runJob, type StudyJob, type StudyJobContext } from './study-job';
import { runJobsOnWorkers } from './worker-pool';
import { stateIsSoc } from '../limits/closed-loop-limits';

/** States closer than this (kWh per kWh of nameplate energy) count as met. */
const MEET_TOLERANCE = 1e-9;

export function canRunInParallel(inputs: AlignedInputs, steps: number, overlap: number): boolean {
  return (
    inputs.site.demandChargePerKw === null &&
    inputs.battery.maxCyclesPerDay === null &&
    stateIsSoc(inputs) &&
    steps >= 4 * overlap
  );
}

interface Stitched extends ScheduleSeriesBuilder {
  plans: PlanLog;
}

type SeriesOf = ScheduleSeries & { readonly plans: PlanLog };

/** A copy of steps [runFrom, at) of `run` (which starts at grid step `runFrom`). */
function cut(run: SeriesOf, runFrom: number, at: number): Stitched {
  const n = at - runFrom;
  const keep = run.plans.start.findIndex((s) => s >= at);
  const k = keep < 0 ? run.plans.start.length : keep;
  return {
    chargeKw: run.chargeKw.slice(0, n),
    dischargeKw: run.dischargeKw.slice(0, n),
    gridImportKw: run.gridImportKw.slice(0, n),
    gridExportKw: run.gridExportKw.slice(0, n),
    socKwh: run.socKwh.slice(0, n + 1),
    plans: {
      start: run.plans.start.slice(0, k),
      share: run.plans.share.slice(0, k),
      leaving: run.plans.leaving.slice(0, k),
      intoCommitted: run.plans.intoCommitted.slice(0, k),
    },
  };
}

/** Appends steps from grid step `at` of `run` (which starts at `runFrom`). */
function append(into: Stitched, run: ClosedLoopRun, runFrom: number, at: number): void {
  const k = at - runFrom;
  into.chargeKw.push(...run.chargeKw.slice(k));
  into.dischargeKw.push(...run.dischargeKw.slice(k));
  into.gridImportKw.push(...run.gridImportKw.slice(k));
  into.gridExportKw.push(...run.gridExportKw.slice(k));
  into.socKwh.push(...run.socKwh.slice(k + 1));
  const plans = run.plans ?? { start: [], share: [], leaving: [], intoCommitted: [] };
  plans.start.forEach((s, i) => {
    if (s < at) return;
    into.plans.start.push(s);
    into.plans.share.push(plans.share[i]!);
    into.plans.leaving.push(plans.leaving[i]!);
    into.plans.intoCommitted.push(plans.intoCommitted[i]!);
  });
}

export interface ParallelReport {
  readonly stretches: number;
  /** Per speculative stretch: the grid step where it met the exact run, or null (recomputed). */
  readonly metAt: readonly (number | null)[];
  /** Windows solved beyond those of the run itself (overlaps and recomputed stretches). */
  readonly extraSolves: number;
}

/**
 * The closed-loop run of `job` over the context's period, on `workers` threads
 * (the calling thread computes the first stretch). Same result as runClosedLoop.
 */
export async function runClosedLoopParallel(
  context: StudyJobContext,
  job: StudyJob,
  workers: number,
): Promise<ClosedLoopRun & { parallel?: ParallelReport }> {
  const started = performance.now();
  const { inputs, from, to, replanSteps: r } = context;
  const grid = (steps: number) => Math.ceil(steps / r) * r;
  const overlap = grid(Math.max(2 * job.horizonSteps, (48 * 60) / inputs.stepMinutes));
  const stretches = Math.min(workers, Math.floor((to - from) / (2 * overlap)));
  if (stretches < 2 || !canRunInParallel(inputs, to - from, overlap)) return runJob(context, job);
  const bounds = Array.from({ length: stretches + 1 }, (_, k) =>
    k === stretches ? to : from + grid(Math.floor(((to - from) * k) / stretches)),
  );
  const speculative: StudyJob[] = bounds.slice(1, -1).map((b, i) => ({
    ...job,
    chunk: { from: b - overlap, stopAt: bounds[i + 2]!, initialEnergyKwh: context.initialEnergyKwh },
  }));
  const pending = runJobsOnWorkers<ClosedLoopRun>(context, speculative, stretches - 1);
  const first = runJob(context, { ...job, chunk: { from, stopAt: bounds[1]!, initialEnergyKwh: context.initialEnergyKwh } });
  const later = await pending;
  if (first.status !== 'optimal') return first;
  let exact = cut({ ...first, plans: first.plans ?? { start: [], share: [], leaving: [], intoCommitted: [] } }, from, bounds[1]!);
  const metAt: (number | null)[] = [];
  let solved = first.solves + later.reduce((n, run) => n + run.solves, 0);
  const tolerance = MEET_TOLERANCE * inputs.battery.energyKwh;
  for (let k = 1; k < stretches; k++) {
    const candidate = later[k - 1]!;
    const start = bounds[k]! - overlap;
    let met: number | null = null;
    for (let t = start; t <= bounds[k]! && candidate.status === 'optimal'; t += r) {
      if (Math.abs(exact.socKwh[t - from]! - candidate.socKwh[t - start]!) <= tolerance) {
        met = t;
        break;
      }
    }
    metAt.push(met);
    if (met !== null) {
      exact = cut(exact, from, met);
      append(exact, candidate, start, met);
    } else {
      const redo = runJob(context, {
        ...job,
        chunk: { from: bounds[k]!, stopAt: bounds[k + 1]!, initialEnergyKwh: exact.socKwh[bounds[k]! - from]! },
      });
      if (redo.status !== 'optimal') return redo;
      solved += redo.solves;
      append(exact, redo, bounds[k]!, bounds[k]!);
    }
  }
  const windows = Math.ceil((to - from) / r);
  return finish(context, exact, first.method, (performance.now() - started) / 1000, {
    stretches,
    metAt,
    extraSolves: solved - windows,
  });
}

function finish(
  context: StudyJobContext,
  run: Stitched,
  method: ClosedLoopRun['method'],
  seconds: number,
  parallel: ParallelReport,
): ClosedLoopRun & { parallel: ParallelReport } {
  const { inputs, from, to } = context;
  const cost = scheduleCost(
    {
      stepHours: inputs.stepHours,
      priceImport: inputs.priceImport.slice(from, to),
      priceExport: inputs.priceExport.slice(from, to),
      degradationCostPerMwh: inputs.battery.degradationCostPerMwh,
      demandChargePerKw: inputs.site.demandChargePerKw,
    },
    run,
  );
  const solves = Math.ceil((to - from) / context.replanSteps);
  const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
  const figures = run.plans.start.length > 0;
  return {
    status: 'optimal',
    cost,
    equivalentCycles: (sum(run.dischargeKw) * inputs.stepHours) / usableEnergyKwh(inputs.battery),
    solves,
    seconds,
    ...run,
    nearSteadyShare: figures ? sum(run.plans.share) / solves : NaN,
    meanLeavingArcSteps: figures ? sum(run.plans.leaving) / solves : NaN,
    leavingIntoCommitted: sum(run.plans.intoCommitted),
    method,
    parallel,
  };
}
