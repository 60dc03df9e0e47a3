/**
 * One run of a horizon study (a horizon and a terminal rule) and the context all
 * runs share, as plain data that can cross to a worker thread.
 */
import type { AlignedInputs } from '../inputs/align-inputs';
import type { SteadyCycle } from '../steady/solve-steady-cycle';
import type { TerminalChoice } from '../terminal/terminal-choice';
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

/** A run without its series (they stay in the thread that computed them). */
export type StudyJobResult = Omit<
  ClosedLoopRun,
  'chargeKw' | 'dischargeKw' | 'gridImportKw' | 'gridExportKw' | 'socKwh' | 'plans'
>;

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

export function withoutSeries(run: ClosedLoopRun): StudyJobResult {
  const { chargeKw: _c, dischargeKw: _d, gridImportKw: _m, gridExportKw: _x, socKwh: _e, plans: _p, ...figures } = run;
  return figures;
}

export function runStudyJob(context: StudyJobContext, job: StudyJob): StudyJobResult {
  return withoutSeries(runJob(context, job));
}
