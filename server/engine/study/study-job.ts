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
  readonly referenceSoc: readonly number[];
  readonly bandFraction: number;
  readonly method: 'auto' | 'lp' | 'dp';
}

export interface StudyJob {
  readonly horizonHours: number;
  readonly horizonSteps: number;
  readonly terminal: TerminalChoice;
}

/** A run without its series (they stay in the thread that computed them). */
export type StudyJobResult = Omit<ClosedLoopRun, 'chargeKw' | 'dischargeKw' | 'gridImportKw' | 'gridExportKw' | 'socKwh'>;

export function runStudyJob(context: StudyJobContext, job: StudyJob): StudyJobResult {
  const run = runClosedLoop(context.inputs, {
    from: context.from,
    to: context.to,
    horizonSteps: job.horizonSteps,
    replanSteps: context.replanSteps,
    terminal: job.terminal,
    initialEnergyKwh: context.initialEnergyKwh,
    referenceSoc: context.referenceSoc,
    bandFraction: context.bandFraction,
    method: context.method,
    ...(context.steady ? { steady: context.steady } : {}),
  });
  const { chargeKw: _c, dischargeKw: _d, gridImportKw: _m, gridExportKw: _x, socKwh: _e, ...figures } = run;
  return figures;
}
