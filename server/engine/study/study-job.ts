/**
 * One run of a horizon study (a horizon and a terminal rule) and the context all
 * runs share, as plain data that can cross to a worker thread.
 */
import type { AlignedInputs } from '../inputs/align-inputs';
import type { SteadyCycle } from '../steady/solve-steady-cycle';
import type { TerminalChoice } from '../terminal/terminal-choice';
import { cyclingCheck, type CyclingCheck } from '../plan/cycling-check';
import { runClosedLoop, type ClosedLoopRun } from './run-closed-loop';

export interface StudyJobContext {
  readonly inputs: AlignedInputs;
  readonly from: number;
  readonly to: number;
  readonly replanSteps: number;
  readonly initialEnergyKwh: number;
  readonly steady?: SteadyCycle;
  /** Reference SoC at the end of each step of [from, to), for the plans' figures (none: no figures). */
  readonly referenceSoc?: readonly number[];
  readonly bandFraction: number;
  readonly method: 'auto' | 'lp' | 'dp';
}

export interface StudyJob {
  readonly horizonHours: number;
  readonly horizonSteps: number;
  readonly terminal: TerminalChoice;
  /** Only a stretch of the period, from a given energy (speculative parallel closed loop). */
  readonly chunk?: { readonly from: number; readonly stopAt: number; readonly initialEnergyKwh: number };
}

/** A run without its series (they stay in the thread that computed them), with what the study needs of them. */
export type StudyJobResult = Omit<
  ClosedLoopRun,
  'chargeKw' | 'dischargeKw' | 'gridImportKw' | 'gridExportKw' | 'socKwh' | 'plans'
> & {
  /** Energy at the end of the period, kWh (NaN when the run failed). */
  readonly endEnergyKwh: number;
  /** Equivalent full cycles per local day against the battery's rating (null when the run failed). */
  readonly cycling: CyclingCheck | null;
};

/** The closed-loop run of a job, series included. */
export function runJob(context: StudyJobContext, job: StudyJob): ClosedLoopRun {
  const from = job.chunk?.from ?? context.from;
  return runClosedLoop(context.inputs, {
    from,
    to: context.to,
    horizonSteps: job.horizonSteps,
    replanSteps: context.replanSteps,
    terminal: job.terminal,
    initialEnergyKwh: job.chunk?.initialEnergyKwh ?? context.initialEnergyKwh,
    ...(context.referenceSoc
      ? { referenceSoc: from === context.from ? context.referenceSoc : context.referenceSoc.slice(from - context.from) }
      : {}),
    bandFraction: context.bandFraction,
    method: context.method,
    ...(job.chunk ? { stopAt: job.chunk.stopAt } : {}),
    ...(context.steady ? { steady: context.steady } : {}),
  });
}

/** The figures of a run over the whole period of `context`, without its series. */
export function withoutSeries(context: StudyJobContext, run: ClosedLoopRun): StudyJobResult {
  const { chargeKw: _c, dischargeKw, gridImportKw: _m, gridExportKw: _x, socKwh, plans: _p, ...figures } = run;
  const optimal = run.status === 'optimal';
  return {
    ...figures,
    endEnergyKwh: optimal ? socKwh[socKwh.length - 1]! : NaN,
    cycling: optimal ? cyclingCheck(context.inputs, context.from, dischargeKw) : null,
  };
}

export function runStudyJob(context: StudyJobContext, job: StudyJob): StudyJobResult {
  return withoutSeries(context, runJob(context, job));
}
